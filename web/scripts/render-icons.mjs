// Renders the app icons (web/public/icons/*.png) from our own drawing, peakwise-icon.svg.
// The PNGs are committed, so a build never runs this; run it again after changing the SVG:
//   node web/scripts/render-icons.mjs
// sharp comes from the workspace (the API uses it for photos); it is not a web dependency.
import { readFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';

const icons = join(dirname(fileURLToPath(import.meta.url)), '..', 'public', 'icons');
const svg = await readFile(join(icons, 'peakwise-icon.svg'));

// 192 and 512 are what install prompts ask for; 180 is the home-screen size iPhones use.
// The drawing is full-bleed with its content inside the middle 80 %, so the same picture serves
// as "any" and "maskable".
const sizes = [
  { size: 180, file: 'apple-touch-icon-180.png' },
  { size: 192, file: 'icon-192.png' },
  { size: 512, file: 'icon-512.png' },
];

for (const { size, file } of sizes) {
  await sharp(svg, { density: Math.ceil((72 * size) / 512) * 2 })
    .resize(size, size)
    .png({ compressionLevel: 9, palette: true })
    .toFile(join(icons, file));
  console.log(`${file} ${size}×${size}`);
}
