/**
 * Renders the app icons in public/icons/*.svg to the PNG sizes the web app manifest lists, with
 * Debian's Chromium. Run after changing an icon: `npx tsx scripts/make-icons.ts`; the PNGs are committed.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { chromiumArgs, chromiumPath } from './lib/chromium';

const dir = path.resolve(import.meta.dirname, '..', 'public', 'icons');
const wanted = [
  { svg: 'icon.svg', png: 'icon-192.png', size: 192 },
  { svg: 'icon.svg', png: 'icon-512.png', size: 512 },
  { svg: 'icon.svg', png: 'apple-touch-icon-180.png', size: 180 },
  { svg: 'icon-maskable.svg', png: 'icon-maskable-512.png', size: 512 },
];

const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: chromiumArgs });
try {
  for (const { svg, png, size } of wanted) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    const markup = readFileSync(path.join(dir, svg), 'utf8').replace('<svg ', `<svg width="${size}" height="${size}" `);
    await page.setContent(`<html><body style="margin:0;background:transparent">${markup}</body></html>`);
    await page.screenshot({ path: path.join(dir, png), omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } });
    await page.close();
    console.log(`${png} (${size}×${size})`);
  }
} finally {
  await browser.close();
}
