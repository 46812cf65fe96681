/**
 * `npm test`: installs and starts what the tests need (MariaDB, Debian's Chromium), then runs
 * every Vitest project: unit, api, component and browser. Extra arguments go to Vitest.
 */
import { spawnSync } from 'node:child_process';
import { ensureChromium } from './lib/chromium';
import { ensureMariadb } from './lib/mariadb';

const mariadb = await ensureMariadb();
ensureChromium();
const result = spawnSync('npx', ['vitest', 'run', ...process.argv.slice(2)], { stdio: 'inherit', env: process.env });
await mariadb.stop();
process.exit(result.status ?? 1);
