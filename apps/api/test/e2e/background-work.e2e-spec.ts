import type { FailedWork } from '@benchproof/contracts';
import { IMAGE, type ImageAdapter } from '../../src/infra/image';
import { binary, bookJob, derivativesSettled, solidJpeg } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/**
 * Issue 20: photos stored while the disk was full end with their derivatives failed. The image
 * adapter here fails with ENOSPC (a fake full disk) until "space returns"; the manager then sees
 * the failed work and retries it from the app, and the thumbnail appears.
 */
describe('failed background work: the manager retries it', () => {
  let t: TestApp;
  let mech: SignedIn;
  let manager: SignedIn;
  let spaceLeft = false;
  beforeAll(async () => {
    t = await startTestApp({ TASK_BACKOFF_MS: '20' });
    const image = t.app.get<ImageAdapter>(IMAGE);
    const real = image.renditions.bind(image);
    image.renditions = (...args) =>
      spaceLeft ? real(...args) : Promise.reject(Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' }));
    mech = await t.signIn(DEMO.mechanic);
    manager = await t.signIn(DEMO.manager);
  });
  afterAll(() => t.close());

  it('lists the failed derivatives to the manager only, and a retry after space returns makes the thumbnail', async () => {
    const jobId = await bookJob(t);
    const upload = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'frame_fork')
      .attach('files', await solidJpeg(640, 480), 'shot.jpg')
      .expect(201);
    const asset = upload.body.assets[0] as { id: number };
    await derivativesSettled(t);
    expect((await mech.agent.get(`/api/jobs/${jobId}/media/${asset.id}`).expect(200)).body.status).toBe('failed');

    const list = (await manager.agent.get('/api/background-work/failed').expect(200)).body as FailedWork[];
    const failed = list.find((w) => w.kind === 'media.derivatives' && w.key === String(asset.id));
    expect(failed).toMatchObject({ attempts: 3, lastError: expect.stringContaining('ENOSPC'), jobId });
    // The screen names the job by its number, as the jobs list does.
    const job = (await manager.agent.get(`/api/jobs/${jobId}`).expect(200)).body as { number: string };
    expect(failed?.jobNumber).toBe(job.number);
    // A full disk is transient: it is also tried again by itself, later (a long backoff).
    expect(Date.parse(failed?.nextTryAt ?? '')).toBeGreaterThan(Date.now() + 60_000);

    await mech.agent.get('/api/background-work/failed').expect(403);
    await mech.agent.post(`/api/background-work/failed/${failed?.id}/retry`).expect(403);
    const other = await t.signIn(DEMO.otherShopManager);
    expect((await other.agent.get('/api/background-work/failed').expect(200)).body).toEqual([]);
    expect((await other.agent.post(`/api/background-work/failed/${failed?.id}/retry`).expect(404)).body.code).toBe('NOT_FOUND');

    spaceLeft = true;
    await manager.agent.post(`/api/background-work/failed/${failed?.id}/retry`).expect(202);
    await derivativesSettled(t);
    const ready = (await mech.agent.get(`/api/jobs/${jobId}/media/${asset.id}`).expect(200)).body as { status: string; urls: { thumb: string } };
    expect(ready.status).toBe('ready');
    const thumb = (await mech.agent.get(ready.urls.thumb).buffer(true).parse(binary).expect(200)).body as Buffer;
    expect(thumb.subarray(0, 2).toString('hex')).toBe('ffd8'); // a JPEG
    expect(((await manager.agent.get('/api/background-work/failed').expect(200)).body as FailedWork[]).map((w) => w.id)).not.toContain(failed?.id);
    await manager.agent.post(`/api/background-work/failed/${failed?.id}/retry`).expect(404);
  });
});
