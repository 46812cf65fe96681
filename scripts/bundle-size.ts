/**
 * Prints, for each page the build makes, the gzipped size of the JavaScript it loads first (the
 * entry chunk and the chunks it imports statically, read from Vite's manifest). Budget: 200 kB
 * gzipped each.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { projectRoot } from './lib/mariadb';

const budgetKb = 200;
const dist = path.join(projectRoot, 'dist');
const manifest = JSON.parse(readFileSync(path.join(dist, '.vite', 'manifest.json'), 'utf8')) as Record<string, { file: string; isEntry?: boolean; imports?: string[] }>;

/** The chunks an entry loads before it runs: itself and what it imports statically. */
function collect(key: string, seen: Set<string>) {
  if (seen.has(key)) return seen;
  seen.add(key);
  for (const dep of manifest[key].imports ?? []) collect(dep, seen);
  return seen;
}

// Each page of the build (index.html, the app; late-boil-check.html, the public check's own page) on its own.
let over = false;
for (const [key, chunk] of Object.entries(manifest)) {
  if (!chunk.isEntry) continue;
  let total = 0;
  for (const dep of collect(key, new Set())) {
    const file = manifest[dep].file;
    const size = gzipSync(readFileSync(path.join(dist, file))).length;
    total += size;
    console.log(`  ${file.padEnd(48)} ${(size / 1024).toFixed(1)} kB gzipped`);
  }
  const kb = total / 1024;
  over ||= kb > budgetKb;
  console.log(`${key}: first-load JavaScript ${kb.toFixed(1)} kB gzipped (budget ${budgetKb} kB) ${kb <= budgetKb ? 'OK' : 'OVER BUDGET'}`);
}
if (over) process.exit(1);
