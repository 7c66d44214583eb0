import { fileURLToPath, URL } from 'node:url';
import { constants as zlibConstants } from 'node:zlib';
import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
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
    // Every text file of the build also as .br and .gz beside it, made once here at the highest
    // levels, so the server sends them without compressing per request
    // (server/middleware/static-files.ts picks one by Accept-Encoding). Source maps are left out:
    // they are never served.
    compression({
      include: /\.(html|js|css|svg|webmanifest)$/,
      exclude: /\.map$/,
      algorithms: [
        defineAlgorithm('brotliCompress', { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: zlibConstants.BROTLI_MAX_QUALITY } }),
        defineAlgorithm('gzip', { level: zlibConstants.Z_BEST_COMPRESSION }),
      ],
      logLevel: 'silent',
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
  build: {
    outDir: 'dist',
    // dist/.vite/manifest.json: which chunks each page loads, for `npm run bench -- firstscreen`.
    // A dot folder: never served, never precached.
    manifest: true,
    // Maps are written (dist/assets/*.map, for reading an error report's stack) but no script
    // points at them, and the server answers 404 for them: the source is not published.
    sourcemap: 'hidden',
    rolldownOptions: {
      output: {
        // Fewer, larger files: a phone on a slow link pays a round trip per file (six at a time
        // over HTTP/1.1), and left alone every icon and small helper is a file of its own.
        codeSplitting: {
          groups: [
            // What every page needs before it draws: one file beside the entry.
            { name: 'app', tags: ['$initial'], priority: 3 },
            // The icons the signed-in screens use, one file instead of one per icon. The few the
            // sign-in page draws stay apart, so that page does not load all of them (its budget:
            // `npm run bench -- firstscreen`).
            {
              name: 'icons',
              test: (id) =>
                /node_modules[\\/]lucide-react[\\/]dist[\\/]esm[\\/]icons[\\/]/.test(id) &&
                !/[\\/](circle-check|info|eye|eye-off)\.mjs$/.test(id),
              priority: 2,
            },
          ],
        },
      },
    },
  },
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
