import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// Client build. The Express server serves dist/ in production and proxies nothing in dev:
// `npm run dev:client` proxies /api to the server on PORT (default 3000).
export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: { outDir: 'dist', chunkSizeWarningLimit: 900 },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
});
