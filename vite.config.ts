import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';
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
  plugins: [react(), tailwindcss(), precompress()],
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
