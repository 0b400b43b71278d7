import { BRAKE_TYPES, CABLE_ROUTINGS, DROPOUT_TYPES, FRAME_MATERIALS } from '@benchproof/domain';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { MediaDerivativesService } from '../../src/media';
import { DEMO, type TestApp } from '../test-app';

/** Books a fresh job in the first demo shop through the public API, as the desk would (new customer, new bike). */
export async function bookJob(t: TestApp): Promise<number> {
  const { agent } = await t.signIn(DEMO.desk);
  const res = await agent
    .post('/api/jobs')
    .send({
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

/** Every regular file under a folder, recursively, as paths relative to it (folders are fine to leave). */
export function filesUnder(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const p = join(d, name);
      if (statSync(p).isDirectory()) walk(p);
      else out.push(p.slice(dir.length));
    }
  };
  walk(dir);
  return out;
}

/** A plain JPEG of one colour. */
export const solidJpeg = (w: number, h: number, colour = '#3a6ea5'): Promise<Buffer> =>
  sharp({ create: { width: w, height: h, channels: 3, background: colour } }).jpeg().toBuffer();

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

/**
 * A minimal ISO base media file (ISO/IEC 14496-12): ftyp, moov with mvhd (timescale
 * 1000, the duration) and one trak/tkhd (width/height as 16.16), then `payload` in mdat.
 * Enough for type sniffing, the duration/size probe and byte-range reads.
 */
export function tinyMp4(durationMs: number, width: number, height: number, payload: Buffer): Buffer {
  const ftyp = box('ftyp', Buffer.from('isom'), Buffer.from([0, 0, 2, 0]), Buffer.from('isomiso2mp41'));
  const mvhd = Buffer.alloc(100);
  mvhd.writeUInt32BE(1000, 12);
  mvhd.writeUInt32BE(durationMs, 16);
  const tkhd = Buffer.alloc(84);
  tkhd.writeUInt32BE(width * 65536, 76);
  tkhd.writeUInt32BE(height * 65536, 80);
  return Buffer.concat([ftyp, box('moov', box('mvhd', mvhd), box('trak', box('tkhd', tkhd))), box('mdat', payload)]);
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
