import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

// '@gaugeproof/source' makes Vite read the shared library's TypeScript source
// instead of its build output (see the library's package.json exports).
const conditions = ['@gaugeproof/source', 'module', 'browser', 'development|production'];

export default defineConfig({
  plugins: [
    react(),
    // The app shell for a bench on a patchy network (issue 15): the service worker keeps the
    // built files, so a page reloads offline. Bench mode registers it (no register code in
    // the first screen's scripts); other screens then keep working as before.
    VitePWA({
      injectRegister: false,
      registerType: 'autoUpdate',
      manifest: false,
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,woff2}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        runtimeCaching: [
          {
            // What bench mode needs to open offline: the session, the lot and the
            // instrument register, fresh from the network whenever it answers.
            urlPattern: ({ url, request }) =>
              request.method === 'GET' &&
              (url.pathname === '/api/auth/me' ||
                /^\/api\/lots\/\d+$/.test(url.pathname) ||
                url.pathname === '/api/instruments'),
            handler: 'NetworkFirst',
            options: {
              // Forgotten at sign-out and sign-in (src/lib/offline-answers.ts).
              cacheName: 'gaugeproof-bench-api',
              networkTimeoutSeconds: 5,
              expiration: { maxEntries: 50 },
            },
          },
        ],
      },
    }),
  ],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
    conditions,
  },
  ssr: { resolve: { conditions } },
  server: {
    port: 5173,
    strictPort: true,
    proxy: { '/api': { target: 'http://localhost:3000', changeOrigin: false } },
  },
  build: {
    outDir: fileURLToPath(new URL('./dist', import.meta.url)),
    emptyOutDir: true,
  },
});
