import { statSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { bookJob, derivativesSettled, solidJpeg } from '../media/media-fixtures';
import { Readable } from 'node:stream';
import { STORAGE, type Storage } from '../../src/infra/storage';
import { DEMO, ON_S3, startTestApp, type SignedIn, type TestApp } from '../test-app';

/** A PNG header (signature + IHDR with a valid CRC) claiming width × height, with one tiny IDAT. */
function pngClaiming(width: number, height: number): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (b: Buffer) => {
    let c = 0xffffffff;
    for (const byte of b) c = crcTable[(c ^ byte) & 0xff] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const out = Buffer.alloc(body.length + 8);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc(body), body.length + 4);
    return out;
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([
    signature,
    chunk('IHDR', ihdr),
    chunk('IDAT', Buffer.from([0x78, 0x9c, 0x03, 0x00, 0x00, 0x00, 0x00, 0x01])),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

describe('media intake: the type comes from the bytes, and a refused file leaves nothing behind', () => {
  let t: TestApp;
  let mech: SignedIn;
  let jobId: number;
  let seeded: string[];
  beforeAll(async () => {
    t = await startTestApp({ MAX_PHOTO_BYTES: String(200 * 1024), MAX_IMAGE_PIXELS: String(40_000_000) });
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
    await derivativesSettled(t);
    seeded = t.storedFiles();
  });
  afterAll(() => t.close());

  const upload = (name: string, bytes: Buffer) =>
    mech.agent.post(`/api/jobs/${jobId}/media`).field('phase', 'before').field('area', 'drivetrain').attach('files', bytes, name);

  it.each([
    ['a shell script named .jpg', 'photo.jpg', () => Buffer.from('#!/bin/sh\nrm -rf /\n'), 415, 'UNSUPPORTED_MEDIA_TYPE'],
    [
      'an SVG named .png',
      'drawing.png',
      () => Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>'),
      415,
      'UNSUPPORTED_MEDIA_TYPE',
    ],
    ['an HTML page named .png', 'page.png', () => Buffer.from('<!doctype html><html><body>hi</body></html>'), 415, 'UNSUPPORTED_MEDIA_TYPE'],
    ['a PDF named .jpg', 'scan.jpg', () => Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n<<>>\nendobj\n'), 415, 'UNSUPPORTED_MEDIA_TYPE'],
    ['an empty file', 'empty.jpg', () => Buffer.alloc(0), 422, 'FILE_EMPTY'],
    ['a PNG header claiming 30000×30000', 'huge.png', () => pngClaiming(30_000, 30_000), 422, 'IMAGE_TOO_LARGE'],
  ])('refuses %s', async (_what, name, make, status, code) => {
    const res = await upload(name, make()).expect(status);
    expect(res.body.code).toBe(code);
    expect(res.body.details.results[0]).toMatchObject({ ok: false, index: 0, name, error: { code } });
  });

  it('refuses a truncated JPEG as FILE_CORRUPT', async () => {
    const whole = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#884422' } })
      .jpeg()
      .toBuffer();
    const res = await upload('cut.jpg', whole.subarray(0, Math.floor(whole.length / 2))).expect(422);
    expect(res.body.code).toBe('FILE_CORRUPT');
  });

  it('refuses a photo above MAX_PHOTO_BYTES with 413 FILE_TOO_LARGE', async () => {
    const noisy = await sharp(Buffer.from(Array.from({ length: 700 * 700 * 3 }, (_, i) => (i * 7919) % 251)), { raw: { width: 700, height: 700, channels: 3 } })
      .jpeg({ quality: 100 })
      .toBuffer();
    expect(noisy.length).toBeGreaterThan(200 * 1024);
    const res = await upload('big.jpg', noisy).expect(413);
    expect(res.body.code).toBe('FILE_TOO_LARGE');
  });

  it('left no file behind after the refusals, and the server still answers', async () => {
    expect(t.storedFiles()).toEqual(seeded);
    await t.http().get('/api/health').expect(200);
  });

  it('reports a mixed batch per file with 207, in the order sent', async () => {
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'after')
      .field('area', 'brakes')
      .field('caption', 'Pads replaced')
      .attach('files', await solidJpeg(64, 48), 'good-1.jpg')
      .attach('files', Buffer.from('plain text'), 'notes.jpg')
      .attach(
        'files',
        await sharp({ create: { width: 30, height: 20, channels: 3, background: '#fff' } })
          .webp()
          .toBuffer(),
        'good-2.webp',
      )
      .expect(207);
    expect(res.body.results.map((r: { ok: boolean; name: string }) => [r.name, r.ok])).toEqual([
      ['good-1.jpg', true],
      ['notes.jpg', false],
      ['good-2.webp', true],
    ]);
    expect(res.body.results[1].error.code).toBe('UNSUPPORTED_MEDIA_TYPE');
    expect(res.body.assets).toHaveLength(2);
    expect(res.body.assets[0]).toMatchObject({
      jobId,
      phase: 'after',
      area: 'brakes',
      caption: 'Pads replaced',
      kind: 'photo',
      source: 'upload',
      mime: 'image/jpeg',
      width: 64,
      height: 48,
    });
    expect(res.body.assets[1]).toMatchObject({ mime: 'image/webp' });
  });

  it('answers 201 when all files are stored; originals are stored by id, read-only, never by the uploaded name', async () => {
    const res = await upload('../../etc/passwd.jpg', await solidJpeg(40, 30)).expect(201);
    expect(res.body.results).toEqual([expect.objectContaining({ ok: true, name: expect.stringContaining('passwd.jpg') })]);
    const stored = t.storedFiles().filter((f) => f.startsWith('/originals/'));
    expect(stored.length).toBeGreaterThan(0);
    expect(stored.filter((f) => f.includes('passwd') || !/^\/originals\/\d+\/[0-9a-f-]{36}$/.test(f))).toEqual([]);
    if (ON_S3) {
      // A bucket has no file modes: a second write of a stored original is refused instead.
      const key = stored[0].slice(1);
      await expect(t.app.get<Storage>(STORAGE).put(key, Readable.from([Buffer.from('x')]), { immutable: true })).rejects.toThrow(/never overwritten/);
      expect((await t.app.get<Storage>(STORAGE).stat(key))?.bytes).toBeGreaterThan(1);
    } else {
      expect(stored.map((f) => (statSync(join(t.cfg.UPLOADS_DIR, f)).mode & 0o777).toString(8))).toEqual(stored.map(() => '444'));
    }
  });

  it('validates the tags and cleans up the temp files when they are wrong', async () => {
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'sometime')
      .field('area', 'drivetrain')
      .attach('files', await solidJpeg(20, 20), 'x.jpg')
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(t.storedFiles().filter((f) => f.startsWith('/tmp/'))).toEqual([]);
  });

  it('keeps stills grabbed from a video tied to that video, and refuses a source that is not a video', async () => {
    const photo = (await upload('p.jpg', await solidJpeg(20, 20)).expect(201)).body.assets[0];
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .field('sourceAssetId', String(photo.id))
      .field('timecodeMs', '1200')
      .attach('files', await solidJpeg(20, 20), 'still.jpg')
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
  });

  it('answers 404 for a job of another shop, and stores nothing', async () => {
    const other = await t.signIn(DEMO.otherShopMechanic);
    const before = t.storedFiles().length;
    const res = await other.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .attach('files', await solidJpeg(20, 20), 'x.jpg')
      .expect(404);
    expect(res.body.code).toBe('NOT_FOUND');
    expect(t.storedFiles().length).toBe(before);
  });
});
