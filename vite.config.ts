import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';
import { precompress } from './scripts/precompress-plugin';
import { API_CACHE } from './src/lib/service-worker';

const DAY_S = 24 * 3600;

// Client build. The Express server serves dist/ in production and proxies nothing in dev:
// `npm run dev:client` proxies /api to the server on PORT (default 3000).
export default defineConfig({
  // precompress: .br and .gz beside each text file; manifest: which chunks each screen loads (scripts/bench-bundle.ts).
  plugins: [
    react(),
    tailwindcss(),
    precompress(),
    // Installable app: dist/manifest.webmanifest and dist/sw.js (Workbox). The worker keeps every built file (the
    // screens open with no network) and answers API reads network first, from its copy when the network is gone.
    VitePWA({
      registerType: 'autoUpdate',
      // Registered from src/lib/service-worker.ts, not by an inline script (the CSP allows no inline script).
      injectRegister: false,
      includeAssets: ['icons/apple-touch-icon.png'],
      manifest: {
        name: 'Fieldshed',
        short_name: 'Fieldshed',
        description: 'Farm-scale erosion and runoff planning on a map.',
        start_url: '/farms',
        scope: '/',
        display: 'standalone',
        background_color: '#f7f3ea',
        theme_color: '#f7f3ea',
        icons: [
          { src: '/icons/fieldshed-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icons/fieldshed-512.png', sizes: '512x512', type: 'image/png' },
          { src: '/icons/fieldshed-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
          { src: '/icons/fieldshed.svg', sizes: 'any', type: 'image/svg+xml' },
        ],
      },
      workbox: {
        // The built client (not the .br/.gz copies, which the server picks per request).
        globPatterns: ['**/*.{js,css,html,svg,png,woff2,webmanifest}'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        clientsClaim: true,
        skipWaiting: true,
        cleanupOutdatedCaches: true,
        runtimeCaching: [
          {
            // API reads of this origin, network first. Never: writes (only GET is matched), sign-in and sign-out and
            // the session's other auth routes (only /api/auth/me is kept, so the app knows who was signed in),
            // invitations and the dev mailbox, downloads made on demand (reports, exports) and job progress.
            urlPattern: ({ url, request, sameOrigin }) =>
              sameOrigin &&
              request.method === 'GET' &&
              url.pathname.startsWith('/api/') &&
              !/^\/api\/(auth\/(?!me$)|invitations\/|dev\/|jobs\/|health$)|\/export$|\.pdf$/.test(url.pathname),
            handler: 'NetworkFirst',
            method: 'GET',
            options: {
              cacheName: API_CACHE,
              networkTimeoutSeconds: 8,
              expiration: { maxEntries: 500, maxAgeSeconds: 30 * DAY_S },
              // 404 too: "no plan for this season yet" is an answer the screens show offline as they did online.
              cacheableResponse: { statuses: [200, 404] },
            },
          },
        ],
      },
    }),
  ],
  build: {
    outDir: 'dist',
    chunkSizeWarningLimit: 900,
    manifest: true,
    // React, the router and TanStack Query change least often: one chunk of their own keeps its
    // cached copy valid across releases that change only the app.
    rolldownOptions: { output: { codeSplitting: { groups: [{ name: 'react-vendor', test: /[\\/]node_modules[\\/](react|react-dom|react-router|scheduler|@tanstack[\\/](query-core|react-query))[\\/]/ }] } } },
  },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
});
