import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';

const apiTarget = process.env.GUMSHOE_API_URL ?? 'http://localhost:3001';

export default defineConfig({
  plugins: [
    react(),
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      includeAssets: ['icon.svg', 'icon-192.png', 'icon-512.png'],
      manifest: {
        name: 'Gumshoe',
        short_name: 'Gumshoe',
        description: 'Checks molded rubber parts at the press, offline first.',
        theme_color: '#17434f',
        background_color: '#f4efe4',
        display: 'standalone',
        orientation: 'landscape',
        start_url: '/',
        icons: [
          { src: '/icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icon-512.png', sizes: '512x512', type: 'image/png' },
          { src: '/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
          { src: '/icon.svg', sizes: 'any', type: 'image/svg+xml' },
        ],
      },
      workbox: {
        // The first load must be controlled so the app works offline straight away.
        clientsClaim: true,
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
      },
    }),
  ],
  server: {
    port: 5173,
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  build: {
    sourcemap: true,
    rolldownOptions: {
      // Ionic's per-component modules only define classes; marking them side-effect free
      // lets unused components drop out of the bundle (Ionic registers what it renders).
      treeshake: {
        moduleSideEffects: (id: string) => !/@ionic[\\/]core[\\/]components[\\/].*\.js$/.test(id),
      },
    },
  },
});
