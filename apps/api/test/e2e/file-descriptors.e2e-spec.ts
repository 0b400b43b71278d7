import { readdirSync } from 'node:fs';
import { request as httpRequest, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { derivativesSettled, paddedMp4, patternBytes } from '../media/media-fixtures';
import { startTestApp, type TestApp } from '../test-app';
import { createLink, ownerScenario, type OwnerScenario } from './owner-helpers';

const ROUNDS = 200;
/** Open descriptors of this process (the server runs in it): Linux only. */
const openFds = (): number => readdirSync('/proc/self/fd').length;
const settle = () => new Promise((r) => setTimeout(r, 300));

/** One GET on the listening server; `cut` destroys the connection as soon as the first body chunk arrives. */
function get(port: number, path: string, headers: Record<string, string>, cut: boolean): Promise<{ status: number; bytes: number }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest({ host: '127.0.0.1', port, path, headers, agent: false }, (res) => {
      let bytes = 0;
      res.on('data', (c: Buffer) => {
        bytes += c.length;
        if (cut) {
          req.destroy();
          resolve({ status: res.statusCode ?? 0, bytes });
        }
      });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, bytes }));
      res.on('error', () => resolve({ status: res.statusCode ?? 0, bytes }));
    });
    req.on('error', (e) => (cut ? resolve({ status: 0, bytes: 0 }) : reject(e)));
    req.end();
  });
}

// Issue 20 item 6: no file answer, finished or cut short by the client, keeps its file open.
describe.skipIf(process.platform !== 'linux')('file descriptors after file answers', () => {
  let t: TestApp;
  let s: OwnerScenario;
  let port: number;
  let cookie: string;
  let token: string;
  let videoId: number;
  let reportPdf: string;
  beforeAll(async () => {
    // No small-derivative memory cache: every answer reads its file, as a cold server does.
    // Owner routes are rate-limited per address; behind a trusted proxy each round can come from its own address.
    t = await startTestApp({ MEDIA_CACHE_MB: '0', TRUST_PROXY: 'loopback' });
    s = await ownerScenario(t);
    const video = paddedMp4(patternBytes(8 * 1024 * 1024));
    const up = await s.mech.agent
      .post(`/api/jobs/${s.jobId}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .attach('files', video, 'long.mp4')
      .expect(201);
    videoId = (up.body as { assets: { id: number }[] }).assets[0].id;
    const draft = (await s.desk.agent.post(`/api/jobs/${s.jobId}/reports/drafts`).expect(202)).body as { id: number };
    await derivativesSettled(t);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    await s.desk.agent.post(`/api/jobs/${s.jobId}/reports/issue`).send({ draftId: draft.id }).expect(202);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    reportPdf = `/api/jobs/${s.jobId}/reports/${draft.id}/pdf`;
    token = (await createLink(s.desk, s.jobId)).token;
    const login = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'desk@lantern-spoke.test', password: (await import('@benchproof/seeds')).DEMO_PASSWORD });
    cookie = ([] as string[])
      .concat(login.headers['set-cookie'] ?? [])
      .map((c) => c.split(';')[0])
      .join('; ');
    const server: Server = t.app.getHttpServer();
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
    port = (server.address() as AddressInfo).port;
  }, 120_000);
  afterAll(() => t.close());

  it(`keeps the open descriptors level over ${ROUNDS} cut-short range requests and ${ROUNDS} complete downloads of each kind`, async () => {
    const staff = { Cookie: cookie };
    const files = [
      { path: `/api/owner/${token}/media/${s.linkedAsset}/screen`, headers: {} },
      { path: `/api/owner/${token}/report.pdf`, headers: {} },
      { path: reportPdf, headers: staff },
      { path: `/api/media/${s.linkedAsset}/screen`, headers: staff },
      { path: `/api/media/${s.linkedAsset}/annotated/screen`, headers: staff },
    ];
    // Warm-up: anything opened once and kept (database pages, the render of the annotated shot) is not a leak.
    for (const f of files) expect((await get(port, f.path, f.headers, false)).status).toBe(200);
    await settle();
    const start = openFds();

    for (let i = 0; i < ROUNDS; i++) {
      const res = await get(port, `/api/media/${videoId}/original`, { ...staff, Range: 'bytes=0-' }, true);
      expect(res.status).toBe(206);
    }
    await settle();
    const afterCut = openFds();

    for (const f of files) {
      for (let i = 0; i < ROUNDS; i++) {
        const res = await get(port, f.path, { ...f.headers, 'X-Forwarded-For': `10.9.${i >> 8}.${i & 255}` }, false);
        expect({ path: f.path, status: res.status, some: res.bytes > 0 }).toEqual({ path: f.path, status: 200, some: true });
      }
    }
    await settle();
    const afterFull = openFds();

    console.info(`open descriptors: start ${start}, after ${ROUNDS} cut-short ranges ${afterCut}, after ${ROUNDS * files.length} downloads ${afterFull}`);
    expect({ afterCut: afterCut - start <= 5, afterFull: afterFull - start <= 5 }).toEqual({ afterCut: true, afterFull: true });
  }, 300_000);
});
