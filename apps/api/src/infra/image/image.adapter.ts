import exifr from 'exifr';
import sharp, { type Sharp } from 'sharp';
import { composeShowcase, type ComposeRequest } from './showcase-compose';

export type ImageCheck =
  | { ok: true; width: number; height: number; format: string; orientation: number }
  | { ok: false; reason: 'too_many_pixels' | 'corrupt' | 'unsupported'; message: string };

export interface Rendition {
  data: Buffer;
  width: number;
  height: number;
}

/**
 * Long-edge limits of the derivatives, in pixels. Print: a two-up report slot is about
 * 3.5 in wide (A4 or Letter with 40 pt margins), so 1000 px lands near 285 dpi there —
 * inside the 200–300 dpi the report aims for (CHECKS.md B.7: 80 mm at 300 dpi = 945 px) —
 * and the PDF embeds these bytes as they are.
 */
export const DERIVATIVE_SIZES = { thumb: 320, screen: 1600, print: 1000 } as const;
export type SizedVariant = keyof typeof DERIVATIVE_SIZES;

/** EXIF data a demo or test image is written with (sharp's withExif/withMetadata). */
export interface ExifToWrite {
  orientation?: number;
  gps?: { lat: number; lon: number };
  takenAt?: Date;
  make?: string;
}

/**
 * Every use of sharp (libvips) sits here. Inputs are opened with a pixel limit
 * against decompression bombs; outputs are JPEG with no metadata at all (sharp
 * drops EXIF/XMP/ICC unless keepExif/withMetadata is called, which only the demo
 * writer below does, to make test and demo inputs).
 */
export class ImageAdapter {
  constructor(private readonly maxPixels: number) {
    // Every photo is decoded once and never again, so libvips' operation cache only holds
    // memory after a burst (sharp's docs: disable it when inputs do not repeat).
    sharp.cache(false);
  }

  private open(input: string | Buffer): Sharp {
    return sharp(input, { limitInputPixels: this.maxPixels, failOn: 'truncated' });
  }

  /** Reads the header, refuses too many pixels before decoding, then decodes once to prove the file is whole. */
  async check(path: string): Promise<ImageCheck> {
    let meta: sharp.Metadata;
    try {
      meta = await this.open(path).metadata();
    } catch (err) {
      return failure((err as Error).message);
    }
    const { width, height, format } = meta;
    if (!width || !height) return { ok: false, reason: 'corrupt', message: 'No image dimensions' };
    if (width * height > this.maxPixels) return { ok: false, reason: 'too_many_pixels', message: `${width}×${height}` };
    try {
      await this.open(path).resize(256, 256, { fit: 'inside' }).toBuffer();
    } catch (err) {
      return failure((err as Error).message);
    }
    return { ok: true, width, height, format: format ?? 'unknown', orientation: meta.orientation ?? 1 };
  }

  /** Pixel size from the header only (no decode, no re-encode). */
  async size(input: Buffer): Promise<{ width: number; height: number }> {
    const meta = await this.open(input).metadata();
    if (!meta.width || !meta.height) throw new Error('No image dimensions');
    return { width: meta.width, height: meta.height };
  }

  /** Whether this libvips build decodes HEIC (HEVC); prebuilt sharp reads only AVIF from the HEIF family. */
  canReadHeic(): boolean {
    const heif = sharp.format.heif as { input?: { file?: boolean; fileSuffix?: string[] } };
    return Boolean(heif.input?.file) && (heif.input?.fileSuffix ?? []).includes('.heic');
  }

  /** Capture time from EXIF DateTimeOriginal (or CreateDate), if the camera wrote one. */
  async captureTime(path: string): Promise<Date | null> {
    try {
      const tags = (await exifr.parse(path, { pick: ['DateTimeOriginal', 'CreateDate'] })) as { DateTimeOriginal?: Date; CreateDate?: Date } | undefined;
      const at = tags?.DateTimeOriginal ?? tags?.CreateDate;
      return at instanceof Date && !Number.isNaN(at.getTime()) ? at : null;
    } catch {
      return null;
    }
  }

  /**
   * One derivative: rotate() applies the EXIF orientation (so the result is upright
   * and carries none), sRGB, fit inside the long edge, baseline JPEG, no metadata.
   */
  async rendition(input: string | Buffer, longEdge: number): Promise<Rendition> {
    const [one] = await this.renditions(input, [longEdge]);
    return one;
  }

  /**
   * Several sizes from ONE decode: the photo is decoded, turned upright, converted to
   * sRGB and scaled to the largest size once; each size is then resized from those
   * pixels in memory. Plain libjpeg at quality 82 with optimised Huffman tables:
   * mozjpeg made the 2400 px size 14 % smaller (784 vs 913 KB) at 3.8× the encode time (863 vs 230 ms, median of 5, textured 12 MP bench photo).
   */
  async renditions(input: string | Buffer, longEdges: readonly number[]): Promise<Rendition[]> {
    const largest = Math.max(...longEdges);
    const { data, info } = await this.open(input)
      .rotate()
      .toColourspace('srgb')
      .resize(largest, largest, { fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .raw()
      .toBuffer({ resolveWithObject: true });
    const raw = { raw: { width: info.width, height: info.height, channels: info.channels } } as const;
    return Promise.all(
      longEdges.map(async (edge) => {
        const out = await sharp(data, raw)
          .resize(edge, edge, { fit: 'inside', withoutEnlargement: true })
          .jpeg({ quality: 82, optimiseCoding: true })
          .toBuffer({ resolveWithObject: true });
        return { data: out.data, width: out.info.width, height: out.info.height };
      }),
    );
  }

  /**
   * The 32×32 greyscale grid the perceptual hash is computed on (libs/domain
   * perceptualHash): upright, `fit: 'fill'` (the whole frame, aspect ignored, as the
   * pHash definition and sharp-phash do), one channel. greyscale() is needed: without it
   * sharp can hand back three channels (CHECKS.md B.9 gotcha).
   */
  async hashGrid(input: string | Buffer, size = 32): Promise<Uint8Array> {
    const { data, info } = await this.open(input)
      .rotate()
      .flatten({ background: '#ffffff' })
      .greyscale()
      .resize(size, size, { fit: 'fill' })
      .raw()
      .toBuffer({ resolveWithObject: true });
    if (info.channels !== 1 || data.length !== size * size) throw new Error(`Expected a ${size}×${size} single-channel grid, got ${info.channels} channels`);
    return new Uint8Array(data.buffer, data.byteOffset, data.length);
  }

  /**
   * Burns an annotation into an upright image: each redaction box is pixelated in the
   * pixels themselves (blocks of ~1/60 of the long edge, at least 8 px, averaged then
   * blown up with nearest neighbour, so nothing can be lifted off), then the SVG of
   * the same pixel size is composited on top. JPEG, no metadata.
   */
  async annotate(upright: Buffer, svg: string, redact: { x: number; y: number; width: number; height: number }[]): Promise<Buffer> {
    const meta = await this.open(upright).metadata();
    const block = Math.max(8, Math.round(Math.max(meta.width ?? 0, meta.height ?? 0) / 60));
    const tiles = await Promise.all(
      redact.map(async (r) => {
        const small = await this.open(upright)
          .extract({ left: r.x, top: r.y, width: r.width, height: r.height })
          .resize(Math.max(1, Math.ceil(r.width / block)), Math.max(1, Math.ceil(r.height / block)), { fit: 'fill', kernel: 'cubic' })
          .toBuffer();
        const input = await sharp(small).resize(r.width, r.height, { fit: 'fill', kernel: 'nearest' }).toBuffer();
        return { input, left: r.x, top: r.y };
      }),
    );
    return this.open(upright)
      .composite([...tiles, { input: Buffer.from(svg), left: 0, top: 0 }])
      .jpeg({ quality: 88, optimiseCoding: true })
      .toBuffer();
  }

  /** A showcase image (composed pair or one shot), exactly the requested size, no metadata (showcase-compose.ts). */
  compose(req: ComposeRequest): Promise<Buffer> {
    return composeShowcase(req);
  }

  /**
   * Encodes pixels (PNG, or an SVG scene as a buffer) to a JPEG carrying EXIF orientation,
   * GPS, capture time and camera make as asked: demo and test inputs whose stripping is checked.
   */
  async jpegWithExif(pixels: Buffer, exif: ExifToWrite = {}): Promise<Buffer> {
    let img = sharp(pixels).flatten({ background: '#ffffff' });
    if (exif.orientation && exif.orientation !== 1) img = img.withMetadata({ orientation: exif.orientation });
    const ifd0: Record<string, string> = exif.make ? { Make: exif.make } : {};
    const ifd2: Record<string, string> = exif.takenAt ? { DateTimeOriginal: exifDate(exif.takenAt) } : {};
    const ifd3 = exif.gps ? gpsIfd(exif.gps.lat, exif.gps.lon) : {};
    if (Object.keys({ ...ifd0, ...ifd2, ...ifd3 }).length) img = img.withExif({ IFD0: ifd0, IFD2: ifd2, IFD3: ifd3 });
    return img.jpeg({ quality: 88 }).toBuffer();
  }

  /** Turns upright pixels into the stored pixels a camera would write for `orientation` (its inverse). */
  async storedForOrientation(upright: Buffer, orientation: number): Promise<Buffer> {
    const undo: Record<number, (s: Sharp) => Sharp> = {
      1: (s) => s,
      3: (s) => s.rotate(180),
      6: (s) => s.rotate(270),
      8: (s) => s.rotate(90),
    };
    const step = undo[orientation];
    if (!step) throw new Error(`Demo images use orientation 1, 3, 6 or 8, not ${orientation}`);
    return step(sharp(upright)).png().toBuffer();
  }
}

/** Sorts a libvips error into the three answers the API gives. */
function failure(message: string): ImageCheck {
  if (/pixel limit/i.test(message)) return { ok: false, reason: 'too_many_pixels', message };
  if (/unsupported|no decoder|compression format/i.test(message)) return { ok: false, reason: 'unsupported', message };
  return { ok: false, reason: 'corrupt', message };
}

function exifDate(d: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getUTCFullYear()}:${p(d.getUTCMonth() + 1)}:${p(d.getUTCDate())} ${p(d.getUTCHours())}:${p(d.getUTCMinutes())}:${p(d.getUTCSeconds())}`;
}

/** GPS IFD strings as sharp's withExif expects them: degrees, minutes, seconds as rationals. */
function gpsIfd(lat: number, lon: number): Record<string, string> {
  const dms = (v: number) => {
    const a = Math.abs(v);
    const deg = Math.floor(a);
    const min = Math.floor((a - deg) * 60);
    const sec = Math.round(((a - deg) * 60 - min) * 60 * 100);
    return `${deg}/1 ${min}/1 ${sec}/100`;
  };
  return { GPSLatitudeRef: lat >= 0 ? 'N' : 'S', GPSLatitude: dms(lat), GPSLongitudeRef: lon >= 0 ? 'E' : 'W', GPSLongitude: dms(lon) };
}

export const IMAGE = Symbol('IMAGE');
