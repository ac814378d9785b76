/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Base path of the API; the built client is served by the same process as the API, so `/api` by default. */
  readonly VITE_API_URL?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
