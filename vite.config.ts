import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { precompress } from './scripts/precompress-plugin';

// Client build. The Express server serves dist/ in production and proxies nothing in dev:
// `npm run dev:client` proxies /api to the server on PORT (default 3000).
export default defineConfig({
  // precompress: .br and .gz beside each text file; manifest: which chunks each screen loads (scripts/bench-bundle.ts).
  plugins: [react(), tailwindcss(), precompress()],
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
