// Renders the app icon (passline.svg, our own design) to the PNG sizes packaging uses:
// NxN.png for Linux desktop entries, and 512x512.png from which electron-builder makes the
// macOS .icns and the Windows .ico. Run: node assets/icons/renderIcons.mjs
import { Resvg } from '@resvg/resvg-js';
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const svg = readFileSync(`${here}passline.svg`, 'utf8');
export const ICON_SIZES = [16, 24, 32, 48, 64, 128, 256, 512];

for (const size of ICON_SIZES) {
  const png = new Resvg(svg, { fitTo: { mode: 'width', value: size } }).render().asPng();
  writeFileSync(`${here}${size}x${size}.png`, png);
}
console.log(`wrote ${ICON_SIZES.map((s) => `${s}x${s}.png`).join(', ')}`);
