// Draws the portal's PNG app icons from its own SVG mark (src/app/icon.svg) with Debian's Chromium, never a
// downloaded browser. Run once after changing the mark: `node src/cli/draw-app-icons.mjs`; the PNGs are committed.
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';

const svg = readFileSync(path.resolve('src/app/icon.svg'), 'utf8');
const targets = [
  { file: 'src/app/apple-icon.png', size: 180 },
  { file: 'public/icons/icon-192.png', size: 192 },
  { file: 'public/icons/icon-512.png', size: 512 },
];

const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking'] });
try {
  for (const { file, size } of targets) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    await page.setContent(`<html><body style="margin:0;background:transparent">${svg.replace('<svg ', `<svg width="${size}" height="${size}" `)}</body></html>`);
    writeFileSync(path.resolve(file), await page.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } }));
    await page.close();
    console.log(`${file}: ${size} × ${size}`);
  }
} finally {
  await browser.close();
}
