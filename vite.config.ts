import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // The installable app: our manifest, and a Workbox service worker that precaches the built
    // shell, route chunks and fonts. No API response is cached by the worker (see decision 0011).
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      includeAssets: ['favicon.svg', 'icons/apple-touch-icon-180.png'],
      manifest: {
        id: '/',
        name: 'Wortwise',
        short_name: 'Wortwise',
        description: 'Brew-day readings, the late-boil check and fermentation for homebrewers and their clubs.',
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        // Our tokens (tailwind.config.js): cellar-700 for the bar, paper for the page.
        theme_color: '#1f3b36',
        background_color: '#fbf8f3',
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
          { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
          { src: '/icons/icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
        ],
      },
      workbox: {
        // The shell, every route chunk, styles and the Latin and Latin Extended fonts; not source maps or other scripts' fonts.
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}', 'assets/*-latin-*.woff2'],
        globIgnores: ['**/*.map', '.vite/**'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        // The first install takes the open page at once (nothing to swap under it); later versions wait for "reload".
        clientsClaim: true,
        skipWaiting: false,
        cleanupOutdatedCaches: true,
        runtimeCaching: [],
      },
    }),
  ],
  resolve: {
    alias: {
      '@/': here('./src/'),
      '@shared/': here('./shared/'),
      '@server/': here('./server/'),
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${process.env.API_PORT ?? 3000}` },
  },
  build: {
    outDir: 'dist',
    sourcemap: true,
    manifest: true,
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['shared/**/*.test.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          environment: 'node',
          include: ['server/**/*.test.ts'],
          globalSetup: ['tests/setup/global-db.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'component',
          environment: 'jsdom',
          include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
          setupFiles: ['tests/setup/jsdom.ts', 'tests/setup/fail-on-console-error.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          environment: 'node',
          include: ['tests/browser/**/*.test.ts'],
          globalSetup: ['tests/setup/global-db.ts', 'tests/setup/global-browser-server.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
