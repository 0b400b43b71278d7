import { BRAKE_TYPES, CABLE_ROUTINGS, DROPOUT_TYPES, FRAME_MATERIALS } from '@benchproof/domain';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { MediaDerivativesService } from '../../src/media';
import { DEMO, type TestApp } from '../test-app';

/** Books a fresh job through the public API (the first demo shop's desk unless `as` says otherwise; new customer, new bike). */
export async function bookJob(t: TestApp, as: string = DEMO.desk): Promise<number> {
  const { agent } = await t.signIn(as);
  const res = await agent.post('/api/jobs').send({
    newCustomer: { name: 'Media Test Owner', email: 'owner@media.test', phone: null, preferredChannel: 'email', notes: null },
    newBike: {
      maker: 'Testwerk',
      model: 'Bench One',
      year: 2020,
      frameMaterial: FRAME_MATERIALS[0],
      size: null,
      colour: null,
      serialNumber: null,
      drivetrainSpeeds: 11,
      brakeType: BRAKE_TYPES[0],
      cableRouting: CABLE_ROUTINGS[0],
      dropoutType: DROPOUT_TYPES[0],
      tyreSize: null,
    },
    reportedSymptoms: 'Creaks under load',
    promisedOn: '2030-01-15',
  });
  if (res.status !== 201) throw new Error(`Booking a job failed: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

/** Waits for the derivative queue to go idle (no timing involved). */
export const derivativesSettled = (t: TestApp): Promise<void> => t.app.get(MediaDerivativesService).settled();

export { filesUnder } from '../test-app';

/** A plain JPEG of one colour. */
export const solidJpeg = (w: number, h: number, colour = '#3a6ea5'): Promise<Buffer> =>
  sharp({ create: { width: w, height: h, channels: 3, background: colour } })
    .jpeg()
    .toBuffer();

/** Reads the average colour of a small square around (x, y) of an image, as [r, g, b]. */
export async function colourAt(img: Buffer, x: number, y: number, box = 6): Promise<[number, number, number]> {
  const { data, info } = await sharp(img).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const sum = [0, 0, 0];
  let n = 0;
  for (let yy = Math.max(0, y - box); yy < Math.min(info.height, y + box); yy++) {
    for (let xx = Math.max(0, x - box); xx < Math.min(info.width, x + box); xx++) {
      const i = (yy * info.width + xx) * info.channels;
      sum[0] += data[i];
      sum[1] += data[i + 1];
      sum[2] += data[i + 2];
      n++;
    }
  }
  return [sum[0] / n, sum[1] / n, sum[2] / n].map(Math.round) as [number, number, number];
}

/** Binary response bodies from supertest. */
export const binary = (res: unknown, cb: (err: Error | null, body: Buffer) => void): void => {
  const stream = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
};

const box = (type: string, ...parts: Buffer[]) => {
  const body = Buffer.concat(parts);
  const head = Buffer.alloc(8);
  head.writeUInt32BE(body.length + 8, 0);
  head.write(type, 4, 'latin1');
  return Buffer.concat([head, body]);
};

const fixture = (name: string) => readFileSync(join(__dirname, name));

/**
 * Real clips made once with ffmpeg 7 from its `testsrc` pattern and committed (a few KB each):
 * `-f lavfi -i testsrc=size=64x48:rate=10 -t 1 -c:v libx264 -movflags +faststart` and
 * `-f lavfi -i testsrc=size=80x60:rate=10 -t 1.5 -c:v libvpx`.
 */
export const CLIP_MP4 = { bytes: fixture('clip-64x48.mp4'), width: 64, height: 48, durationMs: 1000 };
export const CLIP_WEBM = { bytes: fixture('clip-80x60.webm'), width: 80, height: 60, durationMs: 1500 };
/** As the browser's MediaRecorder writes it, without a Duration element (`-f webm -live 1`). */
export const CLIP_WEBM_LIVE = { bytes: fixture('clip-80x60-live.webm'), width: 80, height: 60, durationMs: null };

/**
 * The real MP4 clip followed by a `free` box of `padding` (ISO/IEC 14496-12 §8.1.2: readers
 * skip free space), so a large upload is still a playable 64×48, 1 s video.
 */
export const paddedMp4 = (padding: Buffer): Buffer => Buffer.concat([CLIP_MP4.bytes, box('free', padding)]);

/** What a careless or hostile client sends as clip.mp4: a valid 24-byte `ftyp` box, then noise. */
export function junkMp4(noiseBytes: number): Buffer {
  const ftyp = box('ftyp', Buffer.from('isom'), Buffer.from([0, 0, 2, 0]), Buffer.from('isomiso2'));
  return Buffer.concat([ftyp, patternBytes(noiseBytes, 99)]);
}

/** Deterministic, incompressible-looking bytes. */
export function patternBytes(n: number, seed = 1): Buffer {
  const out = Buffer.alloc(n);
  let x = seed;
  for (let i = 0; i < n; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    out[i] = x >>> 24;
  }
  return out;
}

export interface RawSession {
  cookie: string;
  csrf: string;
}

/** Signs in over plain HTTP and keeps the raw cookies, as a tus client sends them. */
export async function rawSession(t: TestApp, email: string): Promise<RawSession> {
  const res = await t.http().post('/api/auth/login').send({ email, password: 'bench-demo-2026' }).expect(200);
  const cookies = (res.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]);
  return { cookie: cookies.join('; '), csrf: res.body.csrfToken as string };
}
