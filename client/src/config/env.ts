/** Client settings read at build time (Vite `import.meta.env`). */
export const env = {
  /** Base of every API path; same origin as the page unless `VITE_API_URL` points elsewhere. */
  apiUrl: import.meta.env.VITE_API_URL ?? '/api',
} as const;
