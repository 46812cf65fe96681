import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

const brotli = promisify(brotliCompress);
const gz = promisify(gzip);
const compressible = /\.(js|mjs|css|html|svg|json|webmanifest|txt)$/;
/** Below this the headers outweigh the saving. */
const minBytes = 1024;

/**
 * Writes a brotli (.br) and a gzip (.gz) copy beside every text file of the build, once, at the
 * strongest settings, so the server sends compressed bytes without spending CPU on each request
 * (server/app.ts serves them through express-static-gzip). Kept in this file: Vite loads its config
 * best without local imports.
 */
function precompress(): Plugin {
  return {
    name: 'wortwise-precompress',
    apply: 'build',
    async writeBundle(options, bundle) {
      const dir = options.dir ?? 'dist';
      await Promise.all(
        Object.values(bundle).map(async (item) => {
          if (!compressible.test(item.fileName)) return;
          const source = item.type === 'chunk' ? Buffer.from(item.code) : Buffer.from(item.source);
          if (source.length < minBytes) return;
          const file = path.join(dir, item.fileName);
          const [br, gzipped] = await Promise.all([
            brotli(source, { params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: source.length } }),
            gz(source, { level: 9 }),
          ]);
          await Promise.all([writeFile(`${file}.br`, br), writeFile(`${file}.gz`, gzipped)]);
        }),
      );
    },
  };
}

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    precompress(),
    // The installable app: our manifest, and a Workbox service worker that precaches the built
    // shell, route chunks and fonts. No API response is cached by the worker (see decision 0015).
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
        // Not the public check's own page either: once the worker is installed, every page, that
        // one included, opens in the app (the navigation fallback), signed in or not and offline.
        globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}', 'assets/*-latin-*.woff2'],
        globIgnores: ['**/*.map', '.vite/**', 'late-boil-check.html'],
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
    // Maps for our own debugging stay in dist/ but are neither linked from the code nor served (server/app.ts).
    sourcemap: 'hidden',
    manifest: true,
    rolldownOptions: {
      // Two pages: the app, and the public late-boil check's own page for visitors without a session
      // (src/public-check.tsx, decision 0026), which leaves the router and the app shell out.
      input: { index: path.resolve(import.meta.dirname, 'index.html'), 'late-boil-check': path.resolve(import.meta.dirname, 'late-boil-check.html') },
      output: {
        codeSplitting: {
          groups: [
            // Every page needs the framework: chunks cached once, instead of pieces spread over
            // whichever shared chunks happened to import them first. The router is a chunk of its
            // own, since the public check's page needs React and the query cache only.
            { name: 'framework', test: /node_modules[\\/](react|react-dom|scheduler|@tanstack[\\/](query-core|react-query))[\\/]/, priority: 3 },
            { name: 'router', test: /node_modules[\\/]react-router[\\/]/, priority: 2 },
            // The form libraries of our fixed choices, each a chunk of its own so a page's bill shows what
            // they cost (bench:ui's reference rows); both already arrive whole, as one piece each.
            { name: 'zod', test: /node_modules[\\/]zod[\\/]/, priority: 1 },
            { name: 'formik', test: /node_modules[\\/](formik|lodash-es|deepmerge|react-fast-compare|hoist-non-react-statics|react-is|tiny-warning)[\\/]/, priority: 1 },
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
