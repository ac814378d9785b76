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
  },
});
