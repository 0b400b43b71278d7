import { once } from 'node:events';
import { createWriteStream, mkdtempSync, statSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import type { MediaAssetDto, ShotPairDto, ShowcaseItemDto } from '@benchproof/contracts';
import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import yauzl from 'yauzl';
import { DB, type Db } from '../../src/core/db';
import { auditEvents, consents } from '../../src/db/schema';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { binary, bookJob, derivativesSettled } from '../media/media-fixtures';
import { BOX, blurDoc, checkerboard, exifrAll, exiftoolGroups, H, meanAbsDiff, setConsent, W } from '../showcase/showcase-fixtures';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const settled = async (t: TestApp) => {
  await derivativesSettled(t);
  await t.app.get<TaskRunner>(TASK_RUNNER).settled();
};

describe('showcase: consent on the server, clean exports', () => {
  let t: TestApp;
  let mgr: SignedIn;
  let mech: SignedIn;
  let seeded: ShowcaseItemDto[];

  const items = async (query = '') => (await mgr.agent.get(`/api/showcase/items${query}`).expect(200)).body as ShowcaseItemDto[];
  const exportOf = (pairId: number, q: string) => mgr.agent.get(`/api/showcase/items/${pairId}/export?${q}`).buffer(true).parse(binary);

  /** A new job with a checkerboard before (blur box on it) and after, paired; returns ids. */
  async function blurredPair(crop: ShotPairDto['crop']): Promise<{ jobId: number; pairId: number; before: MediaAssetDto }> {
    const jobId = await bookJob(t);
    const up = async (phase: string) =>
      (
        await mech.agent
          .post(`/api/jobs/${jobId}/media`)
          .field('phase', phase)
          .field('area', 'drivetrain')
          .attach('files', await checkerboard(), `${phase}.jpg`)
          .expect(201)
      ).body.assets[0] as MediaAssetDto;
    const before = await up('before');
    const after = await up('after');
    await settled(t);
    await mech.agent.put(`/api/annotations/${before.id}`).send({ baseVersion: 0, document: blurDoc() }).expect(200);
    const pair = (
      await mech.agent
        .post(`/api/jobs/${jobId}/pairs`)
        .send({ beforeAssetId: before.id, afterAssetId: after.id, caption: 'Chain cleaned on the Testwerk Bench One', crop })
        .expect(201)
    ).body as ShotPairDto;
    return { jobId, pairId: pair.id, before };
  }

  beforeAll(async () => {
    t = await startTestApp();
    await settled(t);
    mgr = await t.signIn(DEMO.manager);
    mech = await t.signIn(DEMO.mechanic);
    seeded = await items();
  });
  afterAll(() => t.close());

  it('lists the seeded consented pairs with consent scope and date; desk and mechanic may not', async () => {
    expect(seeded.length).toBeGreaterThanOrEqual(3);
    expect(new Set(seeded.map((i) => i.jobId)).size).toBe(1);
    expect(seeded[0].consent).toMatchObject({ nameMakeModel: true, wordingVersion: 'marketing-photos-v1' });
    expect(seeded.every((i) => i.caption.length > 10)).toBe(true);
    await (await t.signIn(DEMO.desk)).agent.get('/api/showcase/items').expect(403);
    await mech.agent.get('/api/showcase/items').expect(403);
    const brakes = await items('?area=brakes');
    expect(brakes.length).toBeGreaterThan(0);
    expect(brakes.every((i) => i.area === 'brakes')).toBe(true);
    expect(await items('?from=2100-01-01')).toEqual([]);
  });

  it('without consent, outside its wording, or revoked: never listed and never exported', async () => {
    const { jobId, pairId } = await blurredPair(null);
    const listed = async () => (await items()).some((i) => i.pairId === pairId);
    expect(await listed()).toBe(false);
    expect((await exportOf(pairId, 'size=square').expect(409)).body.toString()).toContain('NO_CONSENT');

    // A consent under a wording that never mentioned marketing photos does not cover the showcase.
    const db = t.app.get<Db>(DB);
    db.insert(consents)
      .values({
        shopId: 1,
        jobId,
        granted: true,
        nameMakeModel: false,
        wordingVersion: 'service-updates-v0',
        method: 'in_person',
        givenByName: 'x',
        recordedBy: null,
        ownerLinkId: null,
        at: new Date(),
      })
      .run();
    expect(await listed()).toBe(false);
    expect((await exportOf(pairId, 'size=square').expect(409)).body.toString()).toContain('NO_CONSENT');

    await setConsent(mgr, jobId, true, false);
    const item = (await items()).find((i) => i.pairId === pairId)!;
    // The pair's caption names the bike but the owner did not allow that: a draft is shown instead.
    expect(item.caption).not.toMatch(/Testwerk|Bench One/);
    const named = await mgr.agent.patch(`/api/showcase/items/${pairId}`).send({ caption: 'A Testwerk, fresh' }).expect(409);
    expect(named.body).toMatchObject({ code: 'NO_CONSENT' });
    await exportOf(pairId, 'size=square').expect(200);

    await setConsent(mgr, jobId, false);
    expect(await listed()).toBe(false);
    expect((await exportOf(pairId, 'size=square').expect(409)).body.toString()).toContain('CONSENT_REVOKED');
    db.delete(consents).where(eq(consents.jobId, jobId)).run();
  });

  it('exports have the asked pixel sizes and no metadata at all (exifr, exiftool)', async () => {
    const pairId = seeded[0].pairId;
    const cases = [
      ['variant=pair&size=square', 1080, 1080],
      ['variant=pair&size=portrait', 1080, 1350],
      ['variant=pair&size=banner', 1600, 600],
      ['variant=before&size=square', 1080, 1080],
      ['variant=after&size=banner', 1600, 600],
    ] as const;
    for (const [q, w, h] of cases) {
      const img = (await exportOf(pairId, q).expect(200).expect('content-type', 'image/jpeg')).body as Buffer;
      const meta = await sharp(img).metadata();
      expect({ q, w: meta.width, h: meta.height, exif: meta.exif, icc: meta.icc, xmp: meta.xmp, iptc: meta.iptc }).toEqual({
        q,
        w,
        h,
        exif: undefined,
        icc: undefined,
        xmp: undefined,
        iptc: undefined,
      });
      expect(await exifrAll(img)).toBeUndefined();
      expect(exiftoolGroups(img)).toEqual([]);
    }
    const downloads = (await mgr.agent.get(`/api/showcase/jobs/${seeded[0].jobId}/downloads`).expect(200)).body as {
      pairId: number;
      bytes: number;
      size: string;
    }[];
    expect(downloads.filter((d) => d.pairId === pairId)).toHaveLength(cases.length);
    expect(downloads.every((d) => d.bytes > 1000)).toBe(true);
  });

  it('the blur box is pixelated in the export and the rest matches the original, with the crop applied', async () => {
    // Crop the lower half: 800×300 of the 800×600 shot, exactly 2× into the 1600×600 banner.
    const crop = { x: 0, y: 0.5, w: 1, h: 0.5 };
    const { jobId, pairId } = await blurredPair(crop);
    await setConsent(mgr, jobId, true);
    const out = (await exportOf(pairId, 'variant=before&size=banner').expect(200)).body as Buffer;
    const reference = await sharp(await checkerboard())
      .extract({ left: 0, top: 300, width: W, height: H / 2 })
      .resize(1600, 600)
      .toBuffer();
    const inBox = (x: number, y: number) => x >= BOX.x0 * 2 + 8 && x < BOX.x1 * 2 - 8 && y >= (BOX.y0 - 300) * 2 + 8 && y < (BOX.y1 - 300) * 2 - 8;
    const clear = (x: number, y: number) => !(x >= BOX.x0 * 2 - 40 && x < BOX.x1 * 2 + 40 && y < (BOX.y1 - 300) * 2 + 40) && !(x > 1100 && y > 520);
    const inside = await meanAbsDiff(out, reference, 1600, 600, inBox);
    const outside = await meanAbsDiff(out, reference, 1600, 600, clear);
    console.info(`blurred export vs original: mean |Δ| inside the box ${inside.toFixed(1)}, elsewhere ${outside.toFixed(1)} (0–255)`);
    expect(inside).toBeGreaterThan(60);
    expect(outside).toBeLessThan(12);
  });

  it('a revocation between listing and export, or during a background export, fails it with CONSENT_REVOKED', async () => {
    const { jobId, pairId } = await blurredPair(null);
    await setConsent(mgr, jobId, true);
    expect((await items()).some((i) => i.pairId === pairId)).toBe(true);
    await exportOf(pairId, 'size=portrait').expect(200);
    await setConsent(mgr, jobId, false);
    const res = await mgr.agent.get(`/api/showcase/items/${pairId}/export?size=square`).expect(409);
    expect(res.body).toMatchObject({ code: 'CONSENT_REVOKED' });
    await mgr.agent
      .post('/api/showcase/zip')
      .send({ items: [{ pairId }] })
      .expect(409);

    await setConsent(mgr, jobId, true);
    const many = Array.from({ length: 20 }, () => ({ pairId, size: 'banner' }));
    const task = (await mgr.agent.post('/api/showcase/exports').send({ items: many }).expect(201)).body as { key: string };
    await setConsent(mgr, jobId, false);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    const status = (await mgr.agent.get(`/api/showcase/exports/${task.key}`).expect(200)).body as { state: string; error: string };
    expect(status.state).toBe('failed');
    expect(status.error).toContain('withdrew consent');
    // What did leave the shop before the revocation is listed for take-down.
    const downloads = (await mgr.agent.get(`/api/showcase/jobs/${jobId}/downloads`).expect(200)).body as { pairId: number; size: string }[];
    expect(downloads.filter((d) => d.size === 'portrait')).toEqual([expect.objectContaining({ pairId, size: 'portrait' })]);
    expect(downloads.length).toBeLessThan(1 + many.length);
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
