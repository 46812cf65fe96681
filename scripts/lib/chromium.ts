import { ensureDebianPackage } from './mariadb';

export const chromiumPath = '/usr/bin/chromium';

export function ensureChromium() {
  ensureDebianPackage('chromium', 'chromium');
}

/** Headless flags for Debian's Chromium on a closed network, as root. */
export const chromiumArgs = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];
