import { DomainInputError } from './errors';

/**
 * Perceptual "pHash" (DCT hash), CHECKS.md B.9.
 *
 * Definition: N. Krawetz, "Looks Like It", The Hacker Factor Blog (2011), and
 * C. Zauner, "Implementation and Benchmarking of Perceptual Image Hash Functions",
 * FH Upper Austria (2010): shrink to 32×32 greyscale, take the 2-D DCT-II, keep the
 * 8×8 block of lowest frequencies, and set a bit where a coefficient is above the
 * block's mean. Like libpHash (crop at 1,1) and the npm package sharp-phash, the block
 * starts at u = v = 1, leaving out the DC row and column: they only carry the overall
 * brightness and pure one-axis ramps, which change with the lighting, not the framing.
 * The threshold is the mean, as in sharp-phash (libpHash uses the median).
 *
 * Bit order: bit k = coefficient (u, v) with u = 1 + floor(k / 8) the horizontal and
 * v = 1 + k mod 8 the vertical frequency; k = 0 is the most significant bit of the
 * 16-digit hex string. This matches sharp-phash's fingerprint string bit for bit.
 */
export const PHASH_SAMPLE = 32;
export const PHASH_BLOCK = 8;
export const PHASH_BITS = PHASH_BLOCK * PHASH_BLOCK;

/** cos((2x + 1) u π / 2N), the DCT-II basis, for x, u in 0..N-1. */
const BASIS: readonly Float64Array[] = Array.from({ length: PHASH_SAMPLE }, (_, u) =>
  Float64Array.from({ length: PHASH_SAMPLE }, (_, x) => Math.cos(((2 * x + 1) * u * Math.PI) / (2 * PHASH_SAMPLE))),
);

/**
 * The orthonormal 2-D DCT-II coefficient F(u, v) of a 32×32 row-major image
 * (u horizontal, v vertical): α(u) α(v) Σx Σy f(x, y) cos(…x…u) cos(…y…v),
 * with α(0) = √(1/N), α(k > 0) = √(2/N). The scale does not change any hash bit.
 */
export function dctCoefficient(pixels: ArrayLike<number>, u: number, v: number): number {
  const n = PHASH_SAMPLE;
  let sum = 0;
  for (let y = 0; y < n; y++) {
    const cy = BASIS[v][y];
    let row = 0;
    for (let x = 0; x < n; x++) row += pixels[y * n + x] * BASIS[u][x];
    sum += row * cy;
  }
  const alpha = (k: number) => Math.sqrt((k === 0 ? 1 : 2) / n);
  return alpha(u) * alpha(v) * sum;
}

/**
 * The 64-bit pHash of a 32×32 greyscale image, given row-major (1024 values, any
 * scale such as 0..255), as 16 lower-case hex digits.
 */
export function perceptualHash(pixels: ArrayLike<number>): string {
  if (pixels.length !== PHASH_SAMPLE * PHASH_SAMPLE) {
    throw new DomainInputError(
      'OUT_OF_RANGE',
      `pHash needs ${PHASH_SAMPLE}×${PHASH_SAMPLE} = ${PHASH_SAMPLE * PHASH_SAMPLE} greyscale values, got ${pixels.length}`,
    );
  }
  const block: number[] = [];
  for (let u = 1; u <= PHASH_BLOCK; u++) {
    // Rounded to 1e-6 so that coefficients that are 0 in exact arithmetic (flat or one-axis
    // images) do not set bits from floating-point noise; real images differ by far more.
    for (let v = 1; v <= PHASH_BLOCK; v++) block.push(Math.round(dctCoefficient(pixels, u, v) * 1e6) / 1e6);
  }
  const mean = block.reduce((a, b) => a + b, 0) / block.length;
  return bitsToHex(block.map((c) => c > mean));
}

function bitsToHex(bits: boolean[]): string {
  let hex = '';
  for (let i = 0; i < bits.length; i += 4) {
    const nibble = (bits[i] ? 8 : 0) | (bits[i + 1] ? 4 : 0) | (bits[i + 2] ? 2 : 0) | (bits[i + 3] ? 1 : 0);
    hex += nibble.toString(16);
  }
  return hex;
}

/** Whether a string is a 64-bit hash as this module writes it. */
export function isPerceptualHash(value: string): boolean {
  return /^[0-9a-f]{16}$/.test(value);
}

/** Number of differing bits between two 64-bit hex hashes (0 = same, 64 = every bit differs). */
export function hammingDistance(a: string, b: string): number {
  if (!isPerceptualHash(a) || !isPerceptualHash(b)) throw new DomainInputError('INVALID_FORMAT', 'Hashes must be 16 lower-case hex digits');
  let diff = BigInt(`0x${a}`) ^ BigInt(`0x${b}`);
  let count = 0;
  while (diff > 0n) {
    count += Number(diff & 1n);
    diff >>= 1n;
  }
  return count;
}

/** Bit k of a hash, k = 0 being the most significant (see the bit order above). */
export function hashBit(hash: string, k: number): boolean {
  return ((parseInt(hash[k >> 2], 16) >> (3 - (k & 3))) & 1) === 1;
}
