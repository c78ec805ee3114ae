import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

/**
 * The installable app: a web manifest in Homeground's colours and a service worker (Workbox) that
 * keeps the built app shell on the device, so My batches opens and logs with no signal. API answers
 * are never cached by it (they are personal and change); the batch log keeps its own entries in
 * IndexedDB. The worker is built only for production; `npm run dev` runs without one.
 */
const installableApp = VitePWA({
  registerType: 'autoUpdate',
  // Registered from src/app/register-service-worker.ts (a file, as the CSP allows no inline script).
  injectRegister: false,
  includeAssets: ['seedling.svg', 'icons/apple-touch-icon.png'],
  manifest: {
    name: 'Homeground',
    short_name: 'Homeground',
    description: 'Choose, grow from seed and share the native plants of your ecoregion.',
    lang: 'en',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    // Sedge green and paper, from the design guide's colours.
    theme_color: '#3F6B3A',
    background_color: '#FAF7F0',
    icons: [
      { src: '/icons/app-icon-192.png', sizes: '192x192', type: 'image/png' },
      { src: '/icons/app-icon-512.png', sizes: '512x512', type: 'image/png' },
      { src: '/icons/app-icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  },
  workbox: {
    // The shell, the route chunks and the Latin fonts; other font subsets load when a page needs them.
    globPatterns: ['**/*.{js,css,html,svg,png}', 'assets/*-latin-[0-9]*-normal-*.woff2'],
    navigateFallback: '/index.html',
    // API routes (docs, files, JSON) always go to the server, never to the cached shell.
    navigateFallbackDenylist: [/^\/api(\/|$)/],
    cleanupOutdatedCaches: true,
    clientsClaim: true,
    skipWaiting: true,
  },
  devOptions: { enabled: false },
});

/** Vite for the web app: the dev server forwards /api to the Nest API so the browser sees one origin. */
export default defineConfig({
  plugins: [react(), installableApp],
  server: {
    port: 5173,
    strictPort: true,
    proxy: {
      // A regex key so only /api and /api/… go to Nest, not a page path such as /apiary.
      '^/api(/|$)': { target: 'http://localhost:3000', changeOrigin: false },
    },
  },
  preview: { port: 4173 },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // No maps in the shipped build: they would be served to everyone beside the app (5 MB).
    sourcemap: false,
    // Pages load through route-level lazy imports (src/app/router.tsx); this only keeps the
    // rarely-changing libraries in their own long-cached file, apart from our own code.
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom)[\\/]/ },
          ],
        },
      },
    },
  },
});
