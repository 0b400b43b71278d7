import { once } from 'node:events';
import { createWriteStream, existsSync, mkdtempSync, statSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { ERROR_CODES, type ShowcaseExportTaskDto, type ShowcaseItemDto } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { eq } from 'drizzle-orm';
import yauzl from 'yauzl';
import { DB, type Db } from '../../src/core/db';
import { DOMAIN_EVENTS, type ConsentChangedEvent } from '../../src/core/events';
import { auditEvents } from '../../src/db/schema';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { ShowcaseExportService } from '../../src/showcase/showcase-export.service';
import { binary } from '../media/media-fixtures';
import { setConsent } from '../showcase/showcase-fixtures';
import { blurredPair, exportOf, listItems, settled } from '../showcase/showcase-helpers';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

describe('showcase exports: revocation mid-way, background tasks, streamed zips', () => {
  let t: TestApp;
  let mgr: SignedIn;
  let mech: SignedIn;
  let seeded: ShowcaseItemDto[];

  const items = () => listItems(mgr);
  const status = async (key: string) => (await mgr.agent.get(`/api/showcase/exports/${key}`).expect(200)).body as ShowcaseExportTaskDto;
  const startExport = async (selection: object[]) =>
    (await mgr.agent.post('/api/showcase/exports').send({ items: selection }).expect(201)).body as ShowcaseExportTaskDto;

  beforeAll(async () => {
    t = await startTestApp();
    await settled(t);
    mgr = await t.signIn(DEMO.manager);
    mech = await t.signIn(DEMO.mechanic);
    seeded = await items();
  });
  afterAll(() => t.close());

  it('a revocation between listing and export, or during a background export, fails it with CONSENT_REVOKED', async () => {
    const { jobId, pairId } = await blurredPair(t, mech, null);
    await setConsent(mgr, jobId, true);
    expect((await items()).some((i) => i.pairId === pairId)).toBe(true);
    await exportOf(mgr, pairId, 'size=portrait').expect(200);
    await setConsent(mgr, jobId, false);
    const res = await mgr.agent.get(`/api/showcase/items/${pairId}/export?size=square`).expect(409);
    expect(res.body).toMatchObject({ code: 'CONSENT_REVOKED' });
    await mgr.agent
      .post('/api/showcase/zip')
      .send({ items: [{ pairId }] })
      .expect(409);

    await setConsent(mgr, jobId, true);
    const many = Array.from({ length: 20 }, () => ({ pairId, size: 'banner' }));
    const task = await startExport(many);
    await setConsent(mgr, jobId, false);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    expect(await status(task.key)).toMatchObject({ state: 'failed', code: 'CONSENT_REVOKED', error: expect.stringContaining('withdrew consent') });
    await mgr.agent.get(`/api/showcase/exports/${task.key}/download`).expect(404);
    // What did leave the shop before the revocation is listed for take-down.
    const downloads = (await mgr.agent.get(`/api/showcase/jobs/${jobId}/downloads`).expect(200)).body as { pairId: number; size: string }[];
    expect(downloads.filter((d) => d.size === 'portrait')).toEqual([expect.objectContaining({ pairId, size: 'portrait' })]);
    expect(downloads.length).toBeLessThan(1 + many.length);
  });

  it('a background export reports progress and its zip downloads once done', async () => {
    const selection = seeded.slice(0, 3).map((i) => ({ pairId: i.pairId, size: 'square' }));
    const task = await startExport(selection);
    expect(['queued', 'running']).toContain(task.state);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    expect(await status(task.key)).toEqual({ key: task.key, state: 'done', progress: 1, code: null, error: null });
    const zip = await mgr.agent
      .get(`/api/showcase/exports/${task.key}/download`)
      .buffer(true)
      .parse(binary)
      .expect(200)
      .expect('content-type', 'application/zip');
    expect((zip.body as Buffer).subarray(0, 2).toString()).toBe('PK');
    // Only the user who started it sees it: another shop's manager learns nothing.
    await (await t.signIn(DEMO.otherShopManager)).agent.get(`/api/showcase/exports/${task.key}`).expect(404);
  });

  it('a withdrawal deletes finished zips that hold the job, and keeps the others', async () => {
    const { jobId, pairId } = await blurredPair(t, mech, null);
    await setConsent(mgr, jobId, true);
    const other = seeded.find((i) => i.jobId !== jobId) as ShowcaseItemDto;
    const withJob = await startExport([{ pairId }, { pairId: other.pairId }]);
    const without = await startExport([{ pairId: other.pairId, size: 'banner' }]);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    const zipOf = (key: string) => join(t.cfg.UPLOADS_DIR, 'showcase', `export-${key.toLowerCase()}.zip`);
    expect(existsSync(zipOf(withJob.key))).toBe(true);
    await setConsent(mgr, jobId, false);
    await vi.waitFor(() => expect(existsSync(zipOf(withJob.key))).toBe(false), { timeout: 5_000 });
    const refused = await mgr.agent.get(`/api/showcase/exports/${withJob.key}/download`).expect(409);
    expect(refused.body).toMatchObject({ code: 'CONSENT_REVOKED', message: expect.stringContaining('zip was deleted') });
    expect(existsSync(zipOf(without.key))).toBe(true);
    await mgr.agent.get(`/api/showcase/exports/${without.key}/download`).buffer(true).parse(binary).expect(200);
  });

  it('consent.changed: a withdrawal stops a running export mid-file, empties the job and forgets its marks', async () => {
    const { jobId, pairId } = await blurredPair(t, mech, null);
    await setConsent(mgr, jobId, true);
    await mgr.agent.patch(`/api/showcase/items/${pairId}`).send({ favourite: true, caption: 'Fresh drivetrain, ready to ride' }).expect(200);
    const seen: Pick<ConsentChangedEvent, 'jobId' | 'granted'>[] = [];
    const emitter = t.app.get(EventEmitter2);
    const record = (e: ConsentChangedEvent) => seen.push({ jobId: e.jobId, granted: e.granted });
    emitter.on(DOMAIN_EVENTS.consentChanged, record);

    // The first file never finishes rendering by itself: only the revocation's listener can end this export.
    const files = t.app.get(ShowcaseExportService);
    const real = files.file.bind(files);
    let release = () => undefined as void;
    const stuck = new Promise<void>((r) => (release = r));
    const spy = vi.spyOn(files, 'file').mockImplementationOnce(async (...args) => {
      await stuck;
      return real(...args);
    });
    const task = await startExport([{ pairId }, { pairId, size: 'banner' }]);
    await vi.waitFor(() => expect(spy).toHaveBeenCalled(), { timeout: 10_000 });
    expect((await status(task.key)).state).toBe('running');
    await setConsent(mgr, jobId, false);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    expect(await status(task.key)).toMatchObject({ state: 'failed', code: 'CONSENT_REVOKED', error: ERROR_CODES.CONSENT_REVOKED.message });
    expect((await items()).some((i) => i.jobId === jobId)).toBe(false);
    expect((await mgr.agent.get(`/api/showcase/jobs/${jobId}/downloads`).expect(200)).body).toEqual([]);
    release();
    spy.mockRestore();

    // A later consent starts afresh: no favourite, no caption from before the withdrawal.
    await setConsent(mgr, jobId, true);
    expect((await items()).find((i) => i.pairId === pairId)).toMatchObject({ favourite: false, caption: expect.not.stringContaining('Fresh drivetrain') });
    emitter.off(DOMAIN_EVENTS.consentChanged, record);
    expect(seen).toEqual([
      { jobId, granted: false },
      { jobId, granted: true },
    ]);
  });

  it('consent.changed is published inside the change: a listener that throws rolls the withdrawal back', async () => {
    const jobId = seeded[0].jobId;
    const emitter = t.app.get(EventEmitter2);
    const fail = () => {
      throw new Error('listener failed');
    };
    emitter.on(DOMAIN_EVENTS.consentChanged, fail);
    const res = await mgr.agent.post(`/api/jobs/${jobId}/consent`).send({
      granted: false,
      nameMakeModel: false,
      wordingVersion: seeded[0].consent.wordingVersion,
      givenByName: 'Owner at the counter',
    });
    emitter.off(DOMAIN_EVENTS.consentChanged, fail);
    expect(res.status).toBe(500);
    expect((await items()).filter((i) => i.jobId === jobId)).toHaveLength(seeded.length);
  });

  it('a zip of 50 exports streams: bytes flow before the last file is made, and memory stays bounded', { timeout: 180_000 }, async () => {
    const selection = Array.from({ length: 50 }, (_, i) => ({
      pairId: seeded[i % seeded.length].pairId,
      size: (['square', 'portrait', 'banner'] as const)[i % 3],
    }));
    // A real socket (supertest would buffer): sign in over fetch and keep the session cookie and CSRF token.
    const server: Server = t.app.getHttpServer();
    if (!server.listening) await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: DEMO.manager, password: DEMO_PASSWORD }),
    });
    const session = {
      cookie: login.headers
        .getSetCookie()
        .map((c) => c.split(';')[0])
        .join('; '),
      'x-csrf-token': ((await login.json()) as { csrfToken: string }).csrfToken,
    };
    const path = join(mkdtempSync(join(tmpdir(), 'showcase-zip-')), 'out.zip');
    const db = t.app.get<Db>(DB);
    const exportedSoFar = () => db.select({ id: auditEvents.id }).from(auditEvents).where(eq(auditEvents.action, 'showcase.exported')).all().length;
    const before = exportedSoFar();
    global.gc?.();
    const rss0 = process.memoryUsage().rss;
    let peak = rss0;
    const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 10);
    let atFirstByte = -1;
    const res = await fetch(`${base}/api/showcase/zip`, {
      method: 'POST',
      headers: { ...session, 'content-type': 'application/json' },
      body: JSON.stringify({ items: selection }),
    });
    expect(res.status).toBe(200);
    const file = createWriteStream(path);
    for await (const c of Readable.fromWeb(res.body as never)) {
      if (atFirstByte < 0) atFirstByte = exportedSoFar() - before;
      if (!file.write(c)) await once(file, 'drain');
    }
    await new Promise((r) => file.end(r));
    clearInterval(timer);
    const zipBytes = statSync(path).size;
    const growthMb = (peak - rss0) / 2 ** 20;
    console.info(
      `zip of 50 exports: ${(zipBytes / 2 ** 20).toFixed(1)} MiB streamed; first bytes after ${atFirstByte} of 50 files; peak RSS growth ${growthMb.toFixed(1)} MiB`,
    );
    expect(atFirstByte).toBeLessThan(50);
    const names = await new Promise<string[]>((resolve, reject) =>
      yauzl.open(path, { lazyEntries: false }, (err, zip) => {
        if (err) return reject(err);
        const seen: string[] = [];
        zip.on('entry', (e: yauzl.Entry) => seen.push(e.fileName)).on('end', () => resolve(seen));
      }),
    );
    expect(names).toHaveLength(50);
    // Most of the growth is libvips' working set for one print-size decode and compose (the
    // 50 files themselves are only a few MiB); buffering the whole zip would add it on top.
    expect(growthMb).toBeLessThan(160);
  });
});
