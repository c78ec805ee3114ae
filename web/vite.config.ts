import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

/** Vite for the web app: the dev server forwards /api to the Nest API so the browser sees one origin. */
export default defineConfig({
  plugins: [react()],
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
