import type { MediaAssetDto, UploadBatchResult } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { CLIP_MP4, paddedMp4, patternBytes, solidJpeg } from '../media/media-fixtures';
import { startS3Fake, type S3Fake } from '../support/s3-fake';
import { DEMO } from '../test-app';
import { type BuiltServer, startTwoProcesses } from './built-server';
import { describeRedis, until } from './redis-suite';

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const b64 = (s: string) => Buffer.from(s).toString('base64');

// The "done when": the app as `npm start` runs it with STORAGE=s3 (the fake), TASKS=redis and
// WEB_CONCURRENCY=2, i.e. two API processes behind one port. Every request below goes on a fresh
// connection, which the primary hands round-robin to the two processes, so an upload's steps, its
// derivative task and its reads land on different processes.
describeRedis('media on two API processes, one port, S3 and Redis', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-cluster-media-'));
  let s3: S3Fake;
  let server: BuiltServer;
  let token: string;
  let jobId: number;
  /** Originals in the bucket (the demo seed's photos go there too). */
  const originals = () => s3.keys().filter((k) => k.startsWith('/originals/')).length;
  let seeded = 0;

  const api = (path: string, init: RequestInit = {}) =>
    fetch(`${server.base}${path}`, { ...init, headers: { authorization: `Bearer ${token}`, connection: 'close', ...init.headers } });

  beforeAll(async () => {
    s3 = await startS3Fake(join(dir, 's3'));
    server = await startTwoProcesses(dir, s3.env);
    const login = await fetch(`${server.base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: DEMO.mechanic, password: DEMO_PASSWORD }),
    });
    token = login.headers
      .getSetCookie()
      .find((c) => c.startsWith('bp_session='))!
      .split(';')[0]
      .slice('bp_session='.length);
    const open = (await (await api('/api/jobs?open=true')).json()) as { items: { id: number }[] };
    jobId = open.items[0].id;
    seeded = originals();
  });
  afterAll(async () => {
    await server?.stop();
    await s3?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  /** The asset once its derivative task (BullMQ, either process) is through. */
  const settled = (id: number) =>
    until('derivatives', async () => {
      const a = (await (await api(`/api/jobs/${jobId}/media/${id}`)).json()) as MediaAssetDto;
      return a.status === 'pending' ? undefined : a;
    });

  it('a multipart photo is stored in the bucket once, thumbnailed by the task runner, and served with ETag, 304 and Range', async () => {
    const photo = await solidJpeg(1600, 1200, '#7a4f2b');
    const form = new FormData();
    form.set('phase', 'before');
    form.set('area', 'drivetrain');
    form.set('files', new Blob([photo], { type: 'image/jpeg' }), 'chainring.jpg');
    const res = await api(`/api/jobs/${jobId}/media`, { method: 'POST', body: form });
    expect(res.status).toBe(201);
    const [stored] = ((await res.json()) as UploadBatchResult).assets;
    expect(stored.sha256).toBe(sha256(photo));
    expect(await settled(stored.id)).toMatchObject({ status: 'ready' });
    expect(originals()).toBe(seeded + 1);

    const thumb = await api(`/api/media/${stored.id}/thumb`);
    expect(thumb.status).toBe(200);
    expect(await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).toMatchObject({ format: 'jpeg', width: 320, height: 240 });
    const etag = thumb.headers.get('etag')!;
    // A browser revalidating sends max-age=0; without it fetch adds `no-cache`, which asks for the whole file.
    expect((await api(`/api/media/${stored.id}/thumb`, { headers: { 'if-none-match': etag, 'cache-control': 'max-age=0' } })).status).toBe(304);

    const part = await api(`/api/media/${stored.id}/original`, { headers: { range: 'bytes=100-1123' } });
    expect(part.status).toBe(206);
    expect(part.headers.get('content-range')).toBe(`bytes 100-1123/${photo.length}`);
    expect(Buffer.from(await part.arrayBuffer()).equals(photo.subarray(100, 1124))).toBe(true);
  });

  it('a tus upload whose PATCHes land on both processes ends as one byte-identical original in the bucket', async () => {
    const file = paddedMp4(patternBytes(2 * 1024 * 1024, 11));
    const meta = `jobId ${b64(String(jobId))},phase ${b64('before')},area ${b64('frame_interior')},source ${b64('scope')},filename ${b64('bore.mp4')}`;
    const tus = { 'tus-resumable': '1.0.0' };
    const created = await api('/api/media/tus', { method: 'POST', headers: { ...tus, 'upload-length': String(file.length), 'upload-metadata': meta } });
    expect(created.status).toBe(201);
    const path = new URL(created.headers.get('location')!, server.base).pathname;
    const chunk = Math.ceil(file.length / 4);
    let assetId = 0;
    for (let offset = 0; offset < file.length; offset += chunk) {
      const body = file.subarray(offset, offset + chunk);
      const headers = { ...tus, 'upload-offset': String(offset), 'content-type': 'application/offset+octet-stream' };
      const res = await api(path, { method: 'PATCH', headers, body });
      expect(res.status).toBe(204);
      assetId = Number(res.headers.get('benchproof-media-id') ?? 0);
    }
    expect(assetId).toBeGreaterThan(0);
    const asset = await settled(assetId);
    expect(asset).toMatchObject({ kind: 'scope_video', byteSize: file.length, width: CLIP_MP4.width, height: CLIP_MP4.height, sha256: sha256(file) });
    const tail = await api(`/api/media/${assetId}/original`, { headers: { range: `bytes=${file.length - 4096}-` } });
    expect(tail.status).toBe(206);
    expect(Buffer.from(await tail.arrayBuffer()).equals(file.subarray(file.length - 4096))).toBe(true);
    expect(originals()).toBe(seeded + 2);
  });
});
