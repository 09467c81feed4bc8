import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

const apiTarget = `http://127.0.0.1:${process.env.API_PORT ?? 3001}`;

/** Vendor code changes less often than app code, so it gets its own long-cached chunks. */
const vendorGroups = [
  { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|cookie|set-cookie-parser)[\\/]/ },
  { name: 'query', test: /node_modules[\\/]@tanstack[\\/]/ },
  { name: 'zod', test: /node_modules[\\/]zod[\\/]/ },
];

export default defineConfig({
  root: '.',
  publicDir: 'apps/web/public',
  plugins: [react(), tailwindcss()],
  resolve: { alias: { '@': fileURLToPath(new URL('./apps/web/src', import.meta.url)) } },
  build: {
    outDir: 'dist/web',
    emptyOutDir: true,
    // The app runs under a strict CSP (img-src/font-src 'self'), so nothing is inlined as data: URIs.
    assetsInlineLimit: 0,
    // Maps are written for error reports but not referenced by the served bundles.
    sourcemap: 'hidden',
    rolldownOptions: {
      output: { codeSplitting: { groups: vendorGroups } },
    },
  },
  server: {
    host: '127.0.0.1',
    proxy: {
      '/api': {
        target: apiTarget,
        // Keep the browser's Host so the API's same-origin check sees the page's own origin.
        changeOrigin: false,
        // Server-sent event streams stay open for as long as the page does.
        timeout: 0,
        proxyTimeout: 0,
        configure(proxy) {
          proxy.on('proxyReq', (proxyReq, _req, res) => {
            res.on('close', () => proxyReq.destroy());
          });
          proxy.on('proxyRes', (proxyRes, _req, res) => {
            if (proxyRes.headers['content-type']?.startsWith('text/event-stream')) {
              proxyRes.headers['cache-control'] = 'no-cache, no-transform';
              res.flushHeaders();
            }
          });
        },
      },
    },
  },
  preview: { host: '127.0.0.1' },
});
