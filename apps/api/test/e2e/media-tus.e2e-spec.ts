import { createHash } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import { Upload } from 'tus-js-client';
import { bookJob, CLIP_MP4, paddedMp4, patternBytes, rawSession, type RawSession as Session } from '../media/media-fixtures';
import { DEMO, startTestApp, type TestApp } from '../test-app';

const b64 = (s: string) => Buffer.from(s).toString('base64');
const tusHeaders = (s: Session) => ({ 'Tus-Resumable': '1.0.0', Cookie: s.cookie, 'x-csrf-token': s.csrf });

/** Sends a PATCH with `sendBytes` of a declared `declared`-byte body, then cuts the connection (a dropped phone link). */
function interruptedPatch(url: URL, s: Session, offset: number, declared: number, sendBytes: Buffer): Promise<void> {
  return new Promise((resolve) => {
    const req = httpRequest(url, {
      method: 'PATCH',
      headers: { ...tusHeaders(s), 'Upload-Offset': String(offset), 'Content-Type': 'application/offset+octet-stream', 'Content-Length': String(declared) },
    });
    req.on('error', () => resolve());
    req.on('close', () => resolve());
    req.write(sendBytes, () => setImmediate(() => req.destroy()));
  });
}

describe('resumable uploads (tus 1.0) for large videos', () => {
  let t: TestApp;
  let base: string;
  let jobId: number;
  let session: Session;
  beforeAll(async () => {
    t = await startTestApp();
    await t.app.listen(0, '127.0.0.1');
    base = (await t.app.getUrl()).replace('[::1]', '127.0.0.1');
    session = await rawSession(t, DEMO.mechanic);
    jobId = await bookJob(t);
  });
  afterAll(() => t.close());

  it('resumes an upload cut off half way and stores a byte-identical original (SHA-256)', async () => {
    const file = paddedMp4(patternBytes(3 * 1024 * 1024, 7));
    const quarter = Math.floor(file.length / 4);
    const meta = `jobId ${b64(String(jobId))},phase ${b64('before')},area ${b64('frame_interior')},source ${b64('scope')},filename ${b64('run.mp4')},caption`; // an empty value, as tus-js-client sends an empty caption
    const created = await t
      .http()
      .post('/api/media/tus')
      .set(tusHeaders(session))
      .set('Upload-Length', String(file.length))
      .set('Upload-Metadata', meta)
      .expect(201);
    const location = new URL(created.headers.location, base);
    expect(location.pathname).toMatch(/^\/api\/media\/tus\/[0-9a-f]{32}$/);

    await t
      .http()
      .patch(location.pathname)
      .set(tusHeaders(session))
      .set('Upload-Offset', '0')
      .set('Content-Type', 'application/offset+octet-stream')
      .send(file.subarray(0, quarter))
      .expect(204);
    await interruptedPatch(location, session, quarter, file.length - quarter, file.subarray(quarter, 2 * quarter));

    const head = await t.http().head(location.pathname).set(tusHeaders(session)).expect(200);
    const offset = Number(head.headers['upload-offset']);
    expect(offset).toBeGreaterThanOrEqual(quarter);
    expect(offset).toBeLessThanOrEqual(2 * quarter);
    expect(offset).toBeLessThan(file.length);

    const assetId = await new Promise<number>((resolve, reject) => {
      const upload = new Upload(file, {
        uploadUrl: location.toString(),
        headers: { Cookie: session.cookie, 'x-csrf-token': session.csrf },
        chunkSize: 1024 * 1024,
        retryDelays: [],
        onError: reject,
        onSuccess: ({ lastResponse }) => resolve(Number(lastResponse.getHeader('BenchProof-Media-Id'))),
      });
      upload.start();
    });
    const agent = (await t.signIn(DEMO.mechanic)).agent;
    const asset = (await agent.get(`/api/jobs/${jobId}/media/${assetId}`).expect(200)).body;
    expect(asset).toMatchObject({
      kind: 'scope_video',
      mime: 'video/mp4',
      durationMs: CLIP_MP4.durationMs,
      width: CLIP_MP4.width,
      height: CLIP_MP4.height,
      byteSize: file.length,
    });
    expect(asset.sha256).toBe(createHash('sha256').update(file).digest('hex'));
    const status = (await agent.get(location.pathname).expect(200)).body;
    expect(status).toMatchObject({ assetId, offset: file.length, error: null });
    expect(t.storedFiles().filter((f) => f.startsWith('/tus/'))).toEqual([]);
  });

  it('refuses a finished upload that is not media, with the error code, leaving nothing behind', async () => {
    const bytes = Buffer.from('#!/bin/sh\necho not a video\n');
    const meta = `jobId ${b64(String(jobId))},phase ${b64('before')},area ${b64('drivetrain')}`;
    const created = await t
      .http()
      .post('/api/media/tus')
      .set(tusHeaders(session))
      .set('Upload-Length', String(bytes.length))
      .set('Upload-Metadata', meta)
      .expect(201);
    const res = await t
      .http()
      .patch(created.headers.location)
      .set(tusHeaders(session))
      .set('Upload-Offset', '0')
      .set('Content-Type', 'application/offset+octet-stream')
      .send(bytes)
      .expect(415);
    expect(JSON.parse(res.text).code).toBe('UNSUPPORTED_MEDIA_TYPE');
    expect(t.storedFiles().filter((f) => f.startsWith('/tus/'))).toEqual([]);
  });

  it('checks the session, the CSRF header, the job and the shop', async () => {
    const meta = `jobId ${b64(String(jobId))},phase ${b64('before')},area ${b64('drivetrain')}`;
    await t.http().post('/api/media/tus').set('Tus-Resumable', '1.0.0').set('Upload-Length', '10').set('Upload-Metadata', meta).expect(401);
    const noCsrf = await t
      .http()
      .post('/api/media/tus')
      .set({ 'Tus-Resumable': '1.0.0', Cookie: session.cookie })
      .set('Upload-Length', '10')
      .set('Upload-Metadata', meta)
      .expect(403);
    expect(noCsrf.body.code).toBe('CSRF_MISMATCH');
    const other = await rawSession(t, DEMO.otherShopMechanic);
    await t.http().post('/api/media/tus').set(tusHeaders(other)).set('Upload-Length', '10').set('Upload-Metadata', meta).expect(404);
    const mine = await t.http().post('/api/media/tus').set(tusHeaders(session)).set('Upload-Length', '10').set('Upload-Metadata', meta).expect(201);
    const path = new URL(mine.headers.location, base).pathname;
    await t.http().head(path).set(tusHeaders(other)).expect(404);
    await t
      .http()
      .patch(path)
      .set(tusHeaders(other))
      .set('Upload-Offset', '0')
      .set('Content-Type', 'application/offset+octet-stream')
      .send(Buffer.alloc(10))
      .expect(404);
    await t.http().get(path).set({ Cookie: other.cookie }).expect(404);
    await t.http().delete(path).set(tusHeaders(other)).expect(404);
    await t.http().delete(path).set(tusHeaders(session)).expect(204);
  });
});
