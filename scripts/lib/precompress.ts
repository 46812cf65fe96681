/**
 * A Vite plugin that writes a brotli (.br) and a gzip (.gz) copy beside every text file of the
 * build, once, at the strongest settings, so the server sends compressed bytes without spending
 * CPU on each request (server/app.ts serves them through express-static-gzip).
 */
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { brotliCompress, constants, gzip } from 'node:zlib';
import { promisify } from 'node:util';
import type { Plugin } from 'vite';

const brotli = promisify(brotliCompress);
const gz = promisify(gzip);
const compressible = /\.(js|mjs|css|html|svg|json|webmanifest|txt)$/;
/** Below this the headers outweigh the saving. */
const minBytes = 1024;

export function precompress(): Plugin {
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
