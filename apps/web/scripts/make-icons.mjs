// Draws the installed app's icons from BenchProof's own mark (public/benchproof-mark.svg):
// `node apps/web/scripts/make-icons.mjs`. The maskable one puts the mark inside the 80 % safe circle on a
// full-bleed teal square, so a phone's round or squircle mask never cuts a tooth of the chainring.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';

const pub = join(dirname(fileURLToPath(import.meta.url)), '../public');
const mark = readFileSync(join(pub, 'benchproof-mark.svg'));

for (const size of [192, 512]) {
  await sharp(mark, { density: (72 * size) / 64 })
    .resize(size, size)
    .png()
    .toFile(join(pub, `icons/icon-${size}.png`));
}
const inner = await sharp(mark, { density: (72 * 360) / 64 })
  .resize(360, 360)
  .png()
  .toBuffer();
await sharp({ create: { width: 512, height: 512, channels: 4, background: '#1F5F5B' } })
  .composite([{ input: inner, left: 76, top: 76 }])
  .png()
  .toFile(join(pub, 'icons/icon-maskable-512.png'));
