import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// shared/ exports compiled dist for the API; the web bundles its TypeScript source directly so
// that no shared build is needed while developing. Vite maps its nodenext-style `./x.js`
// imports to `./x.ts` on its own.
const sharedSource = fileURLToPath(new URL('../shared/src/index.ts', import.meta.url));
// `@/lib/api-client` instead of climbing `../../..` from deep feature folders.
const webSource = fileURLToPath(new URL('./src/', import.meta.url));

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: [
      { find: /^@peakwise\/shared$/, replacement: sharedSource },
      { find: /^@\//, replacement: webSource },
    ],
  },
  server: {
    // The API serves everything under /api on the same origin in production; mirror that here so
    // the session cookie stays first-party.
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  build: {
    outDir: fileURLToPath(new URL('./dist', import.meta.url)),
    emptyOutDir: true,
  },
});
