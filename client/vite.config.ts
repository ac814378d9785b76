import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

/** Where `npm run dev` forwards `/api`: the NestJS server in watch mode, unless `API_PROXY_TARGET` says otherwise. */
const apiProxyTarget = process.env.API_PROXY_TARGET ?? 'http://localhost:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  optimizeDeps: {
    // Crawl every page up front: lazy routes otherwise reveal new dependencies on first visit, and the
    // dev server's re-optimisation reload breaks that first dynamic import.
    entries: ['index.html', 'src/**/*.{ts,tsx}', '!src/**/*.test.{ts,tsx}', '!src/testing/**'],
  },
  server: {
    port: Number(process.env.CLIENT_DEV_PORT ?? 5173),
    proxy: { '/api': { target: apiProxyTarget, changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: apiProxyTarget, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    rollupOptions: {
      treeshake: {
        // The shared package is pure (no I/O, no globals touched at import), so a page keeps only the
        // schemas it uses instead of every module the barrel re-exports.
        moduleSideEffects: (id: string) => !/[\\/]shared[\\/](dist|src)[\\/]/.test(id),
      },
    },
  },
});
