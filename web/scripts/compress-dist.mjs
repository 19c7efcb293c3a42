#!/usr/bin/env node
// After `vite build`: a gzip and a brotli copy beside every text asset of web/dist, so the API's
// static file server sends them ready-made (@fastify/static `preCompressed`) instead of the raw
// files or compressing on every request. Only node:zlib; the best levels, as this runs once.
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

const dist = process.argv[2] ?? new URL('../dist', import.meta.url).pathname;
const TEXT = /\.(js|mjs|css|html|svg|json|webmanifest|txt)$/;
const MIN_BYTES = 1024;

let files = 0;
let raw = 0;
let gz = 0;
function walk(dir) {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) walk(path);
    else if (TEXT.test(name) && statSync(path).size >= MIN_BYTES) {
      const bytes = readFileSync(path);
      const gzip = gzipSync(bytes, { level: 9 });
      writeFileSync(`${path}.gz`, gzip);
      writeFileSync(`${path}.br`, brotliCompressSync(bytes, { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }));
      files++;
      raw += bytes.length;
      gz += gzip.length;
    }
  }
}
walk(dist);
process.stdout.write(
  `compressed ${files} files: ${(raw / 1024).toFixed(0)} KB → ${(gz / 1024).toFixed(0)} KB gzip (and brotli)\n`,
);
