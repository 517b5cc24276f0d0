import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { contentSecurityPolicy } from './scripts/contentSecurityPolicy';
import { demoBundle } from './scripts/demoBundle';
import { eagerCompile } from './scripts/eagerCompile';
import { preloadPlotly } from './scripts/preloadPlotly';

// Static build: everything is served from the same origin; no request leaves the machine. The
// built index.html carries the Content-Security-Policy of scripts/contentSecurityPolicy.ts.
export default defineConfig({
  base: './',
  plugins: [
    react(), contentSecurityPolicy(), preloadPlotly(), demoBundle('demo-data'),
    // Plotly 4.1.1 has ~400 module bodies and one factory to wrap (scripts/eagerCompile.ts).
    eagerCompile('plotly.js-basic-dist-min/plotly-basic.min.js', 300),
  ],
  worker: { format: 'es' },
  server: { host: '127.0.0.1', port: 5173 },
  preview: { host: '127.0.0.1', port: 4173 },
  build: { target: 'es2022', chunkSizeWarningLimit: 5000 },
});
