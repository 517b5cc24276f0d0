import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// Static build: everything is served from the same origin; no request leaves the machine.
export default defineConfig({
  base: './',
  plugins: [react()],
  worker: { format: 'es' },
  server: { host: '127.0.0.1', port: 5173 },
  preview: { host: '127.0.0.1', port: 4173 },
  build: { target: 'es2022', chunkSizeWarningLimit: 5000 },
});
