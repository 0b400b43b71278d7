import { matrix, multiply, transpose, type Matrix } from 'mathjs';
import { DomainInputError } from './errors';
import { dctCoefficient, hammingDistance, hashBit, perceptualHash, PHASH_SAMPLE } from './perceptual-hash';

const N = PHASH_SAMPLE;

/** A 32×32 row-major image from f(x, y). */
const image = (f: (x: number, y: number) => number): number[] => Array.from({ length: N * N }, (_, i) => f(i % N, Math.floor(i / N)));

/** One DCT-II basis function (u across, v down) over mid-grey: its only non-DC coefficient is (u, v). */
const basis = (u: number, v: number, amplitude: number) =>
  image((x, y) => 128 + amplitude * Math.cos(((2 * x + 1) * u * Math.PI) / (2 * N)) * Math.cos(((2 * y + 1) * v * Math.PI) / (2 * N)));

// Fixtures whose hash follows from the definition by hand (CHECKS.md B.9: pHash per
// Krawetz 2011 / Zauner 2010; block u, v = 1..8, bit k = (u-1)·8 + (v-1), MSB first,
// threshold = mean of the 64 coefficients). A lone positive coefficient c makes the
// mean c/64 < c and every other coefficient 0 < mean: exactly one bit.
const FIXTURES = [
  { name: 'flat grey: all AC coefficients 0, none above the mean 0', pixels: image(() => 128), hash: '0000000000000000' },
  {
    name: 'left half dark, right half light (grid-aligned step along x only: DCT lives in the v = 0 row, outside the block)',
    pixels: image((x) => (x < 16 ? 40 : 220)),
    hash: '0000000000000000',
  },
  { name: 'top half dark (step along y only: u = 0 column, outside the block)', pixels: image((_x, y) => (y < 16 ? 40 : 220)), hash: '0000000000000000' },
  { name: 'basis (1,1) → bit 0', pixels: basis(1, 1, 100), hash: '8000000000000000' },
  { name: 'basis (1,2) → bit 1', pixels: basis(1, 2, 100), hash: '4000000000000000' },
  { name: 'basis (2,1) → bit 8', pixels: basis(2, 1, 100), hash: '0080000000000000' },
  { name: 'basis (3,5) → bit 20', pixels: basis(3, 5, 100), hash: '0000080000000000' },
  { name: 'basis (8,8) → bit 63', pixels: basis(8, 8, 100), hash: '0000000000000001' },
  { name: 'basis (9,9) lies outside the 8×8 block → no bit', pixels: basis(9, 9, 100), hash: '0000000000000000' },
  { name: 'negative basis (1,1): the other 63 coefficients (0) are above the negative mean', pixels: basis(1, 1, -100), hash: '7fffffffffffffff' },
];

describe('perceptualHash: pHash (DCT) against its published definition', () => {
  it.each(FIXTURES)('$name', ({ pixels, hash }) => {
    expect(perceptualHash(pixels)).toBe(hash);
  });

  it('integer pixels (as a decoder gives them) keep the single bit', () => {
    expect(perceptualHash(basis(4, 2, 100).map(Math.round))).toBe(perceptualHash(basis(4, 2, 100)));
    expect(hashBit(perceptualHash(basis(4, 2, 100).map(Math.round)), 3 * 8 + 1)).toBe(true);
  });

  it('ignores overall brightness and contrast (DC excluded, threshold relative)', () => {
    const scene = image((x, y) => ((x * 7 + y * 13) % 17) * 9 + (x > 20 && y < 10 ? 60 : 0));
    const brighter = scene.map((p) => p * 1.1 + 12);
    expect(hammingDistance(perceptualHash(scene), perceptualHash(brighter))).toBe(0);
  });

  it('a mirrored image is far away (CHECKS.md B.9 known limit)', () => {
    // A bright 8×8 block in the top-left corner (grid-aligned), and the same in the top-right.
    const scene = image((x, y) => (x < 8 && y < 8 ? 230 : 30));
    const mirror = image((x, y) => (31 - x < 8 && y < 8 ? 230 : 30));
    expect(hammingDistance(perceptualHash(scene), perceptualHash(mirror))).toBeGreaterThan(10);
  });

  it('refuses a grid that is not 32×32', () => {
    expect(() => perceptualHash(new Array(64).fill(0))).toThrow(DomainInputError);
  });
});

describe('dctCoefficient: independent check with mathjs matrices (F = C·X·Cᵀ, orthonormal DCT-II)', () => {
  // C[k][n] = α(k) cos(π (2n+1) k / 2N): the textbook orthonormal DCT-II matrix.
  const C: Matrix = matrix(
    Array.from({ length: N }, (_, k) =>
      Array.from({ length: N }, (_, n) => Math.sqrt((k === 0 ? 1 : 2) / N) * Math.cos((Math.PI * (2 * n + 1) * k) / (2 * N))),
    ),
  );
  const pseudoRandom = image((x, y) => (x * 37 + y * 91 + ((x * y) % 13) * 17) % 256);
  const rows = Array.from({ length: N }, (_, y) => pseudoRandom.slice(y * N, y * N + N));
  const F = multiply(multiply(C, matrix(rows)), transpose(C)).toArray() as number[][];

  it.each([
    [0, 0],
    [1, 1],
    [3, 7],
    [8, 2],
    [5, 5],
  ])('coefficient (u=%i, v=%i) matches', (u, v) => {
    // F is indexed [v][u]: rows of X are y, so C·X transforms vertically first.
    expect(dctCoefficient(pseudoRandom, u, v)).toBeCloseTo(F[v][u], 9);
  });
});

describe('hammingDistance', () => {
  it.each([
    ['0000000000000000', '0000000000000000', 0],
    ['0000000000000000', 'ffffffffffffffff', 64],
    ['8000000000000000', '0000000000000001', 2],
    ['0f0f0f0f0f0f0f0f', 'f0f0f0f0f0f0f0f0', 64],
    ['00000000000000ff', '000000000000000f', 4],
    ['a5a5a5a5a5a5a5a5', 'a5a5a5a5a5a5a5a4', 1],
  ])('%s vs %s = %i', (a, b, d) => {
    expect(hammingDistance(a, b)).toBe(d);
    expect(hammingDistance(b, a)).toBe(d);
  });

  it('refuses malformed hashes', () => {
    expect(() => hammingDistance('xyz', '0000000000000000')).toThrow(DomainInputError);
    expect(() => hammingDistance('00000000000000000', '0000000000000000')).toThrow(DomainInputError);
  });
});
