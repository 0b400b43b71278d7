import { bookJob, CLIP_MP4, CLIP_WEBM, CLIP_WEBM_LIVE, derivativesSettled, junkMp4 } from '../media/media-fixtures';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const b64 = (s: string) => Buffer.from(s).toString('base64');

/** A video is parsed (MediaInfoLib) before it is kept: junk that merely starts like an MP4 is refused on both routes. */
describe('video intake: a video must be one', () => {
  let t: TestApp;
  let mech: SignedIn;
  let jobId: number;
  let seeded: string[];
  let tus: { Cookie: string; 'x-csrf-token': string; 'Tus-Resumable': string };
  beforeAll(async () => {
    t = await startTestApp();
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
    await derivativesSettled(t);
    seeded = t.storedFiles();
    const login = await t.http().post('/api/auth/login').send({ email: DEMO.mechanic, password: DEMO_PASSWORD }).expect(200);
    const cookie = (login.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    tus = { 'Tus-Resumable': '1.0.0', Cookie: cookie, 'x-csrf-token': login.body.csrfToken as string };
  });
  afterAll(() => t.close());

  const upload = (name: string, bytes: Buffer) =>
    mech.agent.post(`/api/jobs/${jobId}/media`).field('phase', 'before').field('area', 'drivetrain').attach('files', bytes, name);
  const videosOfJob = async () =>
    ((await mech.agent.get(`/api/jobs/${jobId}/media`).expect(200)).body as { mime: string }[]).filter((a) => a.mime.startsWith('video/'));

  it('refuses a 24-byte ftyp box followed by noise, sent as clip.mp4, and keeps nothing (no original, no row, no temp file)', async () => {
    const res = await upload('clip.mp4', junkMp4(20_000)).expect(422);
    expect(res.body).toMatchObject({ code: 'VIDEO_UNREADABLE', message: expect.stringContaining('could not be read') });
    expect(await videosOfJob()).toEqual([]);
    expect(t.storedFiles()).toEqual(seeded);
  });

  it('refuses a WebM header followed by noise (no picture track)', async () => {
    const ebmlHeader = CLIP_WEBM.bytes.subarray(0, 40);
    const res = await upload('clip.webm', Buffer.concat([ebmlHeader, junkMp4(8_000).subarray(24)])).expect(422);
    expect(res.body.code).toBe('VIDEO_UNREADABLE');
    expect(t.storedFiles()).toEqual(seeded);
  });

  it('refuses the same junk over tus with the same JSON error, leaving no partial upload', async () => {
    const bytes = junkMp4(5_000);
    const meta = `jobId ${b64(String(jobId))},phase ${b64('before')},area ${b64('drivetrain')},filename ${b64('clip.mp4')}`;
    const headers = tus;
    const created = await t.http().post('/api/media/tus').set(headers).set('Upload-Length', String(bytes.length)).set('Upload-Metadata', meta).expect(201);
    const res = await t
      .http()
      .patch(created.headers.location)
      .set(headers)
      .set('Upload-Offset', '0')
      .set('Content-Type', 'application/offset+octet-stream')
      .send(bytes)
      .expect(422);
    expect(JSON.parse(res.text)).toMatchObject({ code: 'VIDEO_UNREADABLE', details: null });
    expect(await videosOfJob()).toEqual([]);
    expect(t.storedFiles()).toEqual(seeded);
  });

  it.each([
    ['an H.264 MP4 from a phone', 'clip.mp4', CLIP_MP4, 'video/mp4'],
    ['a VP8 WebM', 'clip.webm', CLIP_WEBM, 'video/webm'],
    ['a live WebM as the browser recorder writes it (no duration in the file)', 'live.webm', CLIP_WEBM_LIVE, 'video/webm'],
  ])('accepts %s and keeps its frame size and length', async (_what, name, clip, mime) => {
    const res = await upload(name, clip.bytes).expect(201);
    expect(res.body.assets[0]).toMatchObject({ mime, width: clip.width, height: clip.height, durationMs: clip.durationMs, byteSize: clip.bytes.length });
  });
});
