// A Vite build step that writes a brotli (.br) and a gzip (.gz) copy beside every text asset of
// the client build, so the server sends compressed files without compressing per request
// (server/middleware/client-files.ts picks the copy the browser accepts).
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';
import type { Plugin } from 'vite';

const brotli = promisify(brotliCompress);
const gz = promisify(gzip);
/** Files worth compressing: text. Fonts (woff2) and images are compressed already. */
const TEXT = /\.(js|mjs|css|html|svg|json|txt|map)$/;
/** Below this many bytes a compressed copy saves less than its headers cost. */
const MIN_BYTES = 1024;

export function precompress(): Plugin {
  let outDir = 'dist';
  return {
    name: 'fieldshed-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    async writeBundle(_options, bundle) {
      const files = Object.keys(bundle).filter((f) => TEXT.test(f) && !f.startsWith('.vite/'));
      await Promise.all(
        files.map(async (f) => {
          const file = path.join(outDir, f);
          const body = await readFile(file);
          if (body.length < MIN_BYTES) return;
          await writeFile(`${file}.br`, await brotli(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: body.length } }));
          await writeFile(`${file}.gz`, await gz(body, { level: 9 }));
        }),
      );
    },
  };
}
