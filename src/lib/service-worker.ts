// The installable app's service worker (dist/sw.js, made by vite-plugin-pwa from vite.config.ts):
// it keeps the built client and answers API reads from its copy when the network is gone.
// Registered in production builds only (the dev server makes no worker).

/** The worker's cache of API answers (GET, network first); vite.config.ts names it from here. */
export const API_CACHE = 'fieldshed-api';

export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch(() => {
      // Without a worker the app still works online; nothing to tell the person.
    });
  });
}

/** After signing out, the answers kept for offline use are another person's: drop them. */
export async function forgetCachedAnswers(): Promise<void> {
  if ('caches' in window) await caches.delete(API_CACHE);
}
