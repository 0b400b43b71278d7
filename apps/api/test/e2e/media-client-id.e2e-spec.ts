import { randomUUID } from 'node:crypto';
import { Upload } from 'tus-js-client';
import { bookJob, derivativesSettled, filesUnder, paddedMp4, patternBytes, rawSession, type RawSession as Session, solidJpeg } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/** One whole tus upload with tus-js-client (a fresh upload each time: no fingerprint reuse); resolves the asset id. */
function tusUpload(base: string, s: Session, file: Buffer, metadata: Record<string, string>): Promise<number> {
  return new Promise((resolve, reject) => {
    const upload = new Upload(file, {
      endpoint: `${base}/api/media/tus`,
      headers: { Cookie: s.cookie, 'x-csrf-token': s.csrf },
      metadata,
      chunkSize: 1024 * 1024,
      retryDelays: [],
      storeFingerprintForResuming: false,
      onError: reject,
      onSuccess: ({ lastResponse }) => resolve(Number(lastResponse.getHeader('BenchProof-Media-Id'))),
    });
    upload.start();
  });
}

describe('a client id makes an upload idempotent: the same shot sent twice is stored once', () => {
  let t: TestApp;
  let base: string;
  let mech: SignedIn;
  let jobId: number;
  const listed = async (job = jobId) => (await mech.agent.get(`/api/jobs/${job}/media`).expect(200)).body as { id: number; caption: string }[];
  beforeAll(async () => {
    t = await startTestApp();
    await t.app.listen(0, '127.0.0.1');
    base = (await t.app.getUrl()).replace('[::1]', '127.0.0.1');
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
  });
  afterAll(() => t.close());

  const send = async (clientId: string, caption: string, status = 201, job = jobId) =>
    mech.agent
      .post(`/api/jobs/${job}/media`)
      .field('phase', 'before')
      .field('area', 'brakes')
      .field('caption', caption)
      .field('clientId', clientId)
      .attach('files', await solidJpeg(64, 48), 'shot.jpg')
      .expect(status);

  it('multipart: the second send answers the first asset and stores no second original', async () => {
    const clientId = randomUUID();
    const before = (await listed()).length;
    const first = await send(clientId, 'Front pads');
    await derivativesSettled(t);
    const originals = filesUnder(t.cfg.UPLOADS_DIR).filter((f) => f.includes('/originals/')).length;
    const second = await send(clientId, 'Front pads, sent again');
    expect(second.body.assets[0].id).toBe(first.body.assets[0].id);
    expect(second.body.assets[0].caption).toBe('Front pads');
    const after = await listed();
    expect(after.length).toBe(before + 1);
    expect(filesUnder(t.cfg.UPLOADS_DIR).filter((f) => f.includes('/originals/')).length).toBe(originals);
    expect(filesUnder(t.cfg.UPLOADS_DIR).filter((f) => f.startsWith('/tmp/'))).toEqual([]);
  });

  it('multipart: two sends at once still make one asset (the unique index decides)', async () => {
    const clientId = randomUUID();
    const before = (await listed()).length;
    const [a, b] = await Promise.all([send(clientId, 'Rotor'), send(clientId, 'Rotor')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.assets[0].id).toBe(b.body.assets[0].id);
    expect((await listed()).length).toBe(before + 1);
  });

  it('multipart: different client ids are different shots; a bad id or one id for several files is refused', async () => {
    const before = (await listed()).length;
    await send(randomUUID(), 'One');
    await send(randomUUID(), 'Two');
    expect((await listed()).length).toBe(before + 2);
    const bad = await send('not-a-uuid', 'Bad', 400);
    expect(bad.body.code).toBe('VALIDATION_FAILED');
    const jpeg = await solidJpeg(64, 48);
    const many = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'brakes')
      .field('clientId', randomUUID())
      .attach('files', jpeg, 'a.jpg')
      .attach('files', jpeg, 'b.jpg')
      .expect(400);
    expect(many.body.code).toBe('VALIDATION_FAILED');
    expect((await listed()).length).toBe(before + 2);
  });

  it('the same id on another job of the shop is a conflict, not a silent move', async () => {
    const clientId = randomUUID();
    await send(clientId, 'Chain');
    const otherJob = await bookJob(t);
    const res = await send(clientId, 'Chain', 409, otherJob);
    expect(res.body.code).toBe('CONFLICT');
    expect(await listed(otherJob)).toEqual([]);
  });

  it('another shop may use the same id: ids are scoped by shop', async () => {
    const clientId = randomUUID();
    await send(clientId, 'Ours');
    const other = await t.signIn(DEMO.otherShopManager);
    const otherJob = await bookJob(t, DEMO.otherShopManager);
    await other.agent
      .post(`/api/jobs/${otherJob}/media`)
      .field('phase', 'before')
      .field('area', 'brakes')
      .field('clientId', clientId)
      .attach('files', await solidJpeg(64, 48), 'shot.jpg')
      .expect(201);
  });

  it('tus: the same client id uploaded twice gives the same asset, one row', async () => {
    const session = await rawSession(t, DEMO.mechanic);
    const clientId = randomUUID();
    const file = paddedMp4(patternBytes(256 * 1024, 3));
    const metadata = { jobId: String(jobId), phase: 'before', area: 'frame_interior', source: 'scope', filename: 'run.mp4', clientId };
    const before = (await listed()).length;
    const first = await tusUpload(base, session, file, metadata);
    const second = await tusUpload(base, session, file, metadata);
    expect(first).toBeGreaterThan(0);
    expect(second).toBe(first);
    expect((await listed()).length).toBe(before + 1);
    expect(filesUnder(t.cfg.UPLOADS_DIR).filter((f) => f.startsWith('/tus/'))).toEqual([]);
  });

  it('multipart then tus with one id (a shot that changed transport between tries) is still one asset', async () => {
    const session = await rawSession(t, DEMO.mechanic);
    const clientId = randomUUID();
    const first = await send(clientId, 'Fork');
    const viaTus = await tusUpload(base, session, await solidJpeg(64, 48), { jobId: String(jobId), phase: 'before', area: 'brakes', clientId });
    expect(viaTus).toBe(first.body.assets[0].id);
  });
});
