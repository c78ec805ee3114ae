/**
 * Registers the service worker that keeps the app shell on the device (built by vite-plugin-pwa into
 * /sw.js). Only in a production build: in `npm run dev` a worker would serve stale files over hot reload.
 * Browsers without service workers simply run online.
 */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch(() => {
      // No worker (e.g. a private window that refuses it): the app still works online.
    });
  });
}
