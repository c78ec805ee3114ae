/**
 * Renders the installable app's PNG icons from the SVGs in public/icons (run by hand after changing
 * them: `node web/scripts/make-icons.mjs`). Browsers want PNGs of 192 and 512 px in the manifest; the
 * maskable one keeps the seedling inside the central safe circle (W3C Web App Manifest, "maskable").
 */
import path from 'node:path';
import sharp from 'sharp';

const icons = path.resolve(import.meta.dirname, '..', 'public', 'icons');
const jobs = [
  ['app-icon.svg', 'app-icon-192.png', 192],
  ['app-icon.svg', 'app-icon-512.png', 512],
  ['app-icon.svg', 'apple-touch-icon.png', 180],
  ['app-icon-maskable.svg', 'app-icon-maskable-512.png', 512],
];
for (const [from, to, size] of jobs) {
  await sharp(path.join(icons, from), { density: 300 }).resize(size, size).png().toFile(path.join(icons, to));
  console.log(`${to}: ${size}×${size}`);
}
