/**
 * Builds the client only when its sources changed: a SHA-256 over every file the build reads
 * (src/, shared/, public/, index.html, the Vite/TypeScript/Tailwind configs, the lockfile) is kept
 * in dist/.build-hash and compared before building.
 */
import { createHash } from 'node:crypto';
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';

const inputs = ['src', 'shared', 'public', 'index.html', 'late-boil-check.html', 'vite.config.ts', 'tsconfig.json', 'tailwind.config.js', 'package-lock.json'];

function filesUnder(root: string, rel: string): string[] {
  const full = path.join(root, rel);
  if (!existsSync(full)) return [];
  const entries = readdirSync(full, { withFileTypes: true, recursive: true });
  return entries.filter((e) => e.isFile()).map((e) => path.relative(root, path.join(e.parentPath, e.name)));
}

/** The hash of every build input, path and content, in a stable order. */
export function clientSourceHash(root: string): string {
  const hash = createHash('sha256');
  const files = inputs.flatMap((rel) => {
    const full = path.join(root, rel);
    if (!existsSync(full)) return [];
    return readdirSync(path.dirname(full), { withFileTypes: true }).find((e) => e.name === path.basename(full))?.isDirectory() ? filesUnder(root, rel) : [rel];
  });
  for (const file of files.sort()) {
    hash.update(file.split(path.sep).join('/')).update('\0').update(readFileSync(path.join(root, file))).update('\0');
  }
  return hash.digest('hex');
}

/** Runs `vite build` unless dist/ was built from exactly these sources; says which it did. */
export function buildClientIfChanged(root: string, outDir = path.join(root, 'dist')): 'built' | 'unchanged' {
  const stamp = path.join(outDir, '.build-hash');
  const current = clientSourceHash(root);
  if (existsSync(path.join(outDir, 'index.html')) && existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === current) return 'unchanged';
  execFileSync('npx', ['vite', 'build', '--logLevel', 'warn', '--outDir', outDir, '--emptyOutDir'], { cwd: root, stdio: 'inherit' });
  writeFileSync(stamp, `${current}\n`);
  return 'built';
}
