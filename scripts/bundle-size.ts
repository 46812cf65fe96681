/**
 * Prints the gzipped size of the JavaScript the first page loads (the entry chunk and the chunks
 * it imports statically, read from Vite's manifest). Budget: 200 kB gzipped.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { projectRoot } from './lib/mariadb';

const budgetKb = 200;
const dist = path.join(projectRoot, 'dist');
const manifest = JSON.parse(readFileSync(path.join(dist, '.vite', 'manifest.json'), 'utf8')) as Record<string, { file: string; isEntry?: boolean; imports?: string[] }>;

const seen = new Set<string>();
function collect(key: string) {
  if (seen.has(key)) return;
  seen.add(key);
  for (const dep of manifest[key].imports ?? []) collect(dep);
}
for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) collect(key);

let total = 0;
for (const key of seen) {
  const file = manifest[key].file;
  const size = gzipSync(readFileSync(path.join(dist, file))).length;
  total += size;
  console.log(`  ${file.padEnd(48)} ${(size / 1024).toFixed(1)} kB gzipped`);
}
const kb = total / 1024;
console.log(`First-page JavaScript: ${kb.toFixed(1)} kB gzipped (budget ${budgetKb} kB) ${kb <= budgetKb ? 'OK' : 'OVER BUDGET'}`);
if (kb > budgetKb) process.exit(1);
