import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

// shared/ exports compiled dist for the API; the web bundles its TypeScript source directly so
// that no shared build is needed while developing. Vite maps its nodenext-style `./x.js`
// imports to `./x.ts` on its own.
const sharedSource = fileURLToPath(new URL('../shared/src/index.ts', import.meta.url));
// `@/lib/api-client` instead of climbing `../../..` from deep feature folders.
const webSource = fileURLToPath(new URL('./src/', import.meta.url));

// The installable app: our manifest and icons (web/public/icons, drawn by us and rendered by
// web/scripts/render-icons.mjs) and one service worker, src/sw.ts, built to /sw.js. It precaches
// the app shell and carries the push handlers; it never caches /api.
const pwa = VitePWA({
  strategies: 'injectManifest',
  srcDir: 'src',
  filename: 'sw.ts',
  // A plain <script src="/registerSW.js">: the API's content security policy allows only scripts
  // from our own origin, so no inline registration.
  injectRegister: 'script',
  registerType: 'autoUpdate',
  injectManifest: {
    // Every page is a lazy chunk: keep them all, so any page opens without a signal.
    globPatterns: ['**/*.{js,css,html,woff2,svg,png,webmanifest}'],
  },
  manifest: {
    name: 'Peakwise',
    short_name: 'Peakwise',
    description: 'A fermentation logbook that learns your sourdough culture and tells you when it will peak.',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    // The theme's slate (the top bar) and cream paper (the page behind it).
    theme_color: '#2F4858',
    background_color: '#FBF7F0',
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  },
  // The dev server runs without a service worker; `vite build` (and the browser tests) have one.
  devOptions: { enabled: false },
});

export default defineConfig({
  plugins: [react(), pwa],
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
