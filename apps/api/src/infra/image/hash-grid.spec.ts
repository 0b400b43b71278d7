import { hammingDistance, perceptualHash } from '@benchproof/domain';
import sharp from 'sharp';
import sharpPhash from 'sharp-phash';
import { ImageAdapter } from './image.adapter';

const adapter = new ImageAdapter(50_000_000);

/**
 * A 256×256 greyscale PNG made of 8×8-pixel blocks aligned to the 32×32 hash grid, so
 * the resampling kernel cannot flip bits (CHECKS.md B.9 advice). Values from a seeded
 * generator: different fixtures, same every run.
 */
async function blockImage(seed: number, transform: (v: number, bx: number, by: number) => number = (v) => v): Promise<Buffer> {
  let s = seed;
  const next = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648) * 255;
  const blocks = Array.from({ length: 32 * 32 }, () => Math.round(next()));
  const px = Buffer.alloc(256 * 256);
  for (let y = 0; y < 256; y++) {
    for (let x = 0; x < 256; x++) {
      const bx = x >> 3;
      const by = y >> 3;
      px[y * 256 + x] = Math.max(0, Math.min(255, Math.round(transform(blocks[by * 32 + bx], bx, by))));
    }
  }
  return sharp(px, { raw: { width: 256, height: 256, channels: 1 } })
    .png()
    .toBuffer();
}

/** sharp-phash returns 64 '0'/'1' characters in the same bit order; as hex for comparison. */
const toHex = (bits: string) => BigInt(`0b${bits}`).toString(16).padStart(16, '0');

describe('pHash of the adapter grid vs the npm reference sharp-phash 2.2.0 (CHECKS.md B.9)', () => {
  it.each([1, 2, 3, 42, 1234])('grid-aligned block image, seed %i: identical hash', async (seed) => {
    const png = await blockImage(seed);
    const ours = perceptualHash(await adapter.hashGrid(png));
    expect(ours).toBe(toHex(await sharpPhash(png)));
  });

  it('the grid is 32×32 single-channel with the block values intact', async () => {
    const grid = await adapter.hashGrid(await blockImage(7, (_v, bx) => (bx < 16 ? 0 : 255)));
    expect(grid).toHaveLength(1024);
    // Cells next to the edge ring a little (Lanczos: 14 and 241, as CHECKS.md B.9 notes); cells away from it are exact.
    expect([grid[0], grid[8], grid[24], grid[31]]).toEqual([0, 0, 255, 255]);
  });

  it('+10 % brightness keeps the hash (distance ≤ 2); a mirror image moves it far (CHECKS.md B.9: 51/64 with sharp-phash)', async () => {
    const base = perceptualHash(await adapter.hashGrid(await blockImage(9, (v) => v * 0.8)));
    const brighter = perceptualHash(await adapter.hashGrid(await blockImage(9, (v) => v * 0.8 * 1.1)));
    const mirrored = await sharp(await blockImage(9, (v) => v * 0.8))
      .flop()
      .png()
      .toBuffer();
    expect(hammingDistance(base, brighter)).toBeLessThanOrEqual(2);
    expect(hammingDistance(base, perceptualHash(await adapter.hashGrid(mirrored)))).toBeGreaterThan(16);
  });
});
