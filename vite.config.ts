import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const apiPort = Number(process.env.API_PORT ?? 3001);

export default defineConfig({
  plugins: [
    react(),
    // The service worker (Workbox, generated at build time) keeps the app shell on the phone, so
    // Gridkeep opens behind a wall with no signal and the outbox can keep its repairs. It caches
    // the built files only: /api answers are never cached (they are per person and change).
    VitePWA({
      strategies: 'generateSW',
      registerType: 'autoUpdate',
      // Registered by src/lib/service-worker.ts, in production builds only.
      injectRegister: false,
      // Lets a technician put Gridkeep on the phone's home screen and open it full screen.
      manifest: {
        name: 'Gridkeep',
        short_name: 'Gridkeep',
        description: 'Service desk and installed-base register for LED video walls',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        theme_color: '#12343b',
        background_color: '#12343b',
        icons: [{ src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
      },
      workbox: {
        globPatterns: ['**/*.{html,js,css,woff2,svg}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
        runtimeCaching: [],
        cleanupOutdatedCaches: true,
        clientsClaim: true,
        skipWaiting: true,
        sourcemap: false,
      },
    }),
  ],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@server': fileURLToPath(new URL('./server', import.meta.url)),
    },
  },
  server: {
    host: '127.0.0.1',
    port: Number(process.env.PORT ?? 5173),
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: { outDir: 'dist', sourcemap: true },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'tests/unit/**/*.test.ts', 'src/**/*.test.{ts,tsx}'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/global-setup.ts'],
          setupFiles: ['tests/setup/integration-setup.ts', 'tests/setup/without-tenant-filter.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
