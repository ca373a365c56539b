import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { precompress } from './scripts/precompress-plugin';

// Client build. The Express server serves dist/ in production and proxies nothing in dev:
// `npm run dev:client` proxies /api to the server on PORT (default 3000).
export default defineConfig({
  // precompress: .br and .gz beside each text file; manifest: which chunks each screen loads (scripts/bench-bundle.ts).
  plugins: [react(), tailwindcss(), precompress()],
  build: { outDir: 'dist', chunkSizeWarningLimit: 900, manifest: true },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
});
