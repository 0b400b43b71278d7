import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CONSENT_WORDING, type AnnotationDocumentDto } from '@benchproof/contracts';
import exifr from 'exifr';
import sharp from 'sharp';
import type { SignedIn } from '../test-app';

export const W = 800;
export const H = 600;
/** The blur box in pixels of the 800×600 shot. */
export const BOX = { x0: 400, y0: 300, x1: 560, y1: 420 };

/** An 8 px checkerboard: pixelation averages it to grey, so a redacted box cannot look like the original. */
export function checkerboard(): Promise<Buffer> {
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) raw.fill(((x >> 3) + (y >> 3)) % 2 ? 225 : 30, (y * W + x) * 3, (y * W + x) * 3 + 3);
  return sharp(raw, { raw: { width: W, height: H, channels: 3 } })
    .jpeg({ quality: 95 })
    .withExif({ IFD0: { Make: 'Fixture camera', Artist: 'Someone' } })
    .toBuffer();
}

export const blurDoc = (): AnnotationDocumentDto => ({
  schemaVersion: 2,
  image: { width: W, height: H },
  shapes: [
    { colour: 'amber', width: 'medium', id: 'b1', kind: 'blur', topLeft: { x: BOX.x0 / W, y: BOX.y0 / H }, bottomRight: { x: BOX.x1 / W, y: BOX.y1 / H } },
  ],
});

export const consentBody = (granted: boolean, nameMakeModel = false) => ({
  granted,
  nameMakeModel,
  wordingVersion: CONSENT_WORDING.version,
  givenByName: 'Owner at the counter',
});

export async function setConsent(staff: SignedIn, jobId: number, granted: boolean, nameMakeModel = false): Promise<void> {
  await staff.agent.post(`/api/jobs/${jobId}/consent`).send(consentBody(granted, nameMakeModel)).expect(201);
}

/** Every metadata block exifr finds (EXIF, GPS, XMP, IPTC, ICC); undefined when there is none. */
export async function exifrAll(img: Buffer): Promise<unknown> {
  return exifr.parse(img, { tiff: true, exif: true, gps: true, xmp: true, iptc: true, icc: true, jfif: false, ihdr: false });
}

/**
 * Tag groups exiftool (Phil Harvey's ExifTool, `exiftool -j -G`) reports beyond the file
 * itself: a clean JPEG has only ExifTool/System/File/Composite (derived from the pixels).
 */
export function exiftoolGroups(img: Buffer): string[] {
  const dir = mkdtempSync(join(tmpdir(), 'showcase-exif-'));
  const path = join(dir, 'x.jpg');
  writeFileSync(path, img);
  const [tags] = JSON.parse(execFileSync('exiftool', ['-j', '-G', path], { encoding: 'utf8' })) as Record<string, unknown>[];
  const groups = new Set(Object.keys(tags).map((k) => k.split(':')[0]));
  for (const g of ['SourceFile', 'ExifTool', 'System', 'File', 'Composite']) groups.delete(g);
  return [...groups];
}

/** Mean absolute per-channel difference (0–255) over the pixels where `inside` says so. */
export async function meanAbsDiff(a: Buffer, b: Buffer, width: number, height: number, inside: (x: number, y: number) => boolean): Promise<number> {
  const [ra, rb] = await Promise.all([a, b].map((img) => sharp(img).removeAlpha().raw().toBuffer()));
  let sum = 0;
  let n = 0;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      if (!inside(x, y)) continue;
      for (let c = 0; c < 3; c++) sum += Math.abs(ra[(y * width + x) * 3 + c] - rb[(y * width + x) * 3 + c]);
      n += 3;
    }
  }
  return sum / n;
}
