import type { MediaAssetDto } from '@benchproof/contracts';
import exifr from 'exifr';
import { createHash } from 'node:crypto';
import piexif from 'piexifjs';
import sharp from 'sharp';
import { binary, bookJob, colourAt, derivativesSettled } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const W = 120;
const H = 80;
const QUADRANTS = { tl: [220, 30, 30], tr: [30, 200, 40], bl: [30, 40, 220], br: [240, 220, 30] } as const;

/** The upright picture: four coloured quadrants, so every flip and turn is visible. */
function uprightPixel(x: number, y: number): readonly number[] {
  const left = x < W / 2;
  const top = y < H / 2;
  return top ? (left ? QUADRANTS.tl : QUADRANTS.tr) : left ? QUADRANTS.bl : QUADRANTS.br;
}

/**
 * Where the upright pixel (x, y) sits in the stored image for each Orientation value,
 * from the CIPA DC-008 / JEITA CP-3451 (Exif) Orientation table, tag 0x0112 from
 * TIFF 6.0: the value says which visual side the stored 0th row and 0th column are.
 * 1 top/left, 2 top/right, 3 bottom/right, 4 bottom/left, 5 left/top, 6 right/top,
 * 7 right/bottom, 8 left/bottom. Values 5–8 store the image H×W.
 */
const STORED_AT: Record<number, (x: number, y: number) => [number, number]> = {
  1: (x, y) => [x, y],
  2: (x, y) => [W - 1 - x, y],
  3: (x, y) => [W - 1 - x, H - 1 - y],
  4: (x, y) => [x, H - 1 - y],
  5: (x, y) => [y, x],
  6: (x, y) => [y, W - 1 - x],
  7: (x, y) => [H - 1 - y, W - 1 - x],
  8: (x, y) => [H - 1 - y, x],
};

/** A JPEG whose stored pixels are the upright picture transformed for `orientation`, tagged with it. */
async function orientedJpeg(orientation: number): Promise<Buffer> {
  const swapped = orientation >= 5;
  const sw = swapped ? H : W;
  const sh = swapped ? W : H;
  const raw = Buffer.alloc(sw * sh * 3);
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const [sx, sy] = STORED_AT[orientation](x, y);
      raw.set(uprightPixel(x, y), (sy * sw + sx) * 3);
    }
  }
  return sharp(raw, { raw: { width: sw, height: sh, channels: 3 } })
    .jpeg({ quality: 95 })
    .withMetadata({ orientation })
    .toBuffer();
}

/** GPS written by piexifjs (an independent EXIF writer), read back by exifr below. */
async function jpegWithGps(): Promise<Buffer> {
  const plain = await sharp({ create: { width: 90, height: 60, channels: 3, background: '#777' } })
    .jpeg()
    .toBuffer();
  const exif = piexif.dump({
    '0th': { [piexif.ImageIFD.Make]: 'BenchCam', [piexif.ImageIFD.Model]: 'Unit 7' },
    Exif: { [piexif.ExifIFD.DateTimeOriginal]: '2026:02:03 09:08:07', [piexif.ExifIFD.BodySerialNumber]: 'SN-123456' },
    GPS: {
      [piexif.GPSIFD.GPSLatitudeRef]: 'N',
      [piexif.GPSIFD.GPSLatitude]: [
        [51, 1],
        [30, 1],
        [0, 1],
      ],
      [piexif.GPSIFD.GPSLongitudeRef]: 'W',
      [piexif.GPSIFD.GPSLongitude]: [
        [0, 1],
        [7, 1],
        [396, 10],
      ],
    },
  });
  return Buffer.from(piexif.insert(exif, plain.toString('binary')), 'binary');
}

const distance = (a: readonly number[], b: readonly number[]) => Math.max(...a.map((v, i) => Math.abs(v - b[i])));

describe('media derivatives: upright, sRGB, no metadata; originals untouched', () => {
  let t: TestApp;
  let mech: SignedIn;
  let jobId: number;
  beforeAll(async () => {
    t = await startTestApp();
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
  });
  afterAll(() => t.close());

  const upload = async (bytes: Buffer, name = 'shot.jpg'): Promise<MediaAssetDto> =>
    (await mech.agent.post(`/api/jobs/${jobId}/media`).field('phase', 'before').field('area', 'frame_fork').attach('files', bytes, name).expect(201)).body
      .assets[0];
  const fetch = (path: string) => mech.agent.get(path).buffer(true).parse(binary).expect(200);

  it.each([1, 2, 3, 4, 5, 6, 7, 8])('orientation %i gives an upright thumb and screen image', async (orientation) => {
    const original = await orientedJpeg(orientation);
    expect(await exifr.orientation(original)).toBe(orientation);
    const asset = await upload(original);
    expect(asset).toMatchObject({ status: 'pending', width: W, height: H });
    await derivativesSettled(t);
    const ready = (await mech.agent.get(`/api/jobs/${jobId}/media/${asset.id}`).expect(200)).body;
    expect(ready.status).toBe('ready');
    for (const variant of ['thumb', 'screen'] as const) {
      const img = (await fetch(ready.urls[variant])).body as Buffer;
      const meta = await sharp(img).metadata();
      expect({ variant, w: meta.width, h: meta.height, orientation: meta.orientation ?? 1 }).toEqual({ variant, w: W, h: H, orientation: 1 });
      for (const [corner, [x, y]] of Object.entries({ tl: [15, 15], tr: [W - 15, 15], bl: [15, H - 15], br: [W - 15, H - 15] })) {
        const seen = await colourAt(img, x, y);
        expect({ orientation, variant, corner, close: distance(seen, QUADRANTS[corner as keyof typeof QUADRANTS]) < 40 }).toEqual({
          orientation,
          variant,
          corner,
          close: true,
        });
      }
    }
  });

  it('strips GPS and camera details from every derivative, keeps the original byte-identical (SHA-256, FIPS 180-4)', async () => {
    const original = await jpegWithGps();
    const gps = await exifr.gps(original);
    expect(gps.latitude).toBeCloseTo(51.5, 9);
    expect(gps.longitude).toBeCloseTo(-(7 / 60 + 39.6 / 3600), 9);
    const asset = await upload(original);
    expect(asset.sha256).toBe(createHash('sha256').update(original).digest('hex'));
    expect(asset.byteSize).toBe(original.length);
    expect(asset.capturedAt).toMatch(/^2026-02-0[23]T/);
    await derivativesSettled(t);
    const ready = (await mech.agent.get(`/api/jobs/${jobId}/media/${asset.id}`).expect(200)).body;
    for (const variant of ['thumb', 'screen', 'print'] as const) {
      const img = (await fetch(ready.urls[variant])).body as Buffer;
      expect(await exifr.gps(img)).toBeUndefined();
      expect(await exifr.parse(img, true)).toBeUndefined();
      expect((await sharp(img).metadata()).exif).toBeUndefined();
    }
    const back = (await fetch(ready.urls.original)).body as Buffer;
    expect(createHash('sha256').update(back).digest('hex')).toBe(asset.sha256);
    expect((await exifr.gps(back)).latitude).toBeCloseTo(51.5, 9);
  });
});
