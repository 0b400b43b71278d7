import type { AnnotationDocumentDto, BackupList, BackupSummary } from '@benchproof/contracts';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadConfig } from '../../src/config';
import { restoreBackup } from '../../src/infra/backup';
import { createStorage } from '../../src/infra/storage';
import { binary } from '../media/media-fixtures';
import { jobWithRecords, settled } from '../reports/report-fixtures';
import { sha256 } from '../reports/pdf-readback';
import { startS3Fake, type S3Fake } from '../support/s3-fake';
import { DEMO, ON_S3, startTestApp, type SignedIn, type TestApp } from '../test-app';

interface Asset {
  id: number;
  sha256: string;
}
interface Report {
  kind: string;
  sha256: string;
  fingerprint: string | null;
  urls: { pdf: string };
}

const doc: AnnotationDocumentDto = {
  schemaVersion: 2,
  image: { width: 1600, height: 1200 },
  shapes: [{ id: 'b1', kind: 'blur', colour: 'amber', width: 'medium', topLeft: { x: 0.1, y: 0.1 }, bottomRight: { x: 0.3, y: 0.3 } }],
};

/** What a manager of the demo shop can see of its records, to compare before the wipe and after the restore. */
async function records(m: SignedIn, jobIds: number[]) {
  const jobs = (await m.agent.get('/api/jobs?pageSize=100').expect(200)).body as unknown;
  const perJob = [];
  for (const id of jobIds) {
    const media = (await m.agent.get(`/api/jobs/${id}/media`).expect(200)).body as Asset[];
    const originals = [];
    for (const a of media) {
      const bytes = (await m.agent.get(`/api/media/${a.id}/original`).buffer(true).parse(binary).expect(200)).body as Buffer;
      originals.push({ id: a.id, recorded: a.sha256, served: sha256(bytes) });
    }
    const annotations = await Promise.all(media.map(async (a) => (await m.agent.get(`/api/annotations/${a.id}`).expect(200)).body as unknown));
    const reports = ((await m.agent.get(`/api/jobs/${id}/reports`).expect(200)).body as Report[]).filter((r) => r.kind === 'issued');
    const pdfs = [];
    for (const r of reports) pdfs.push(sha256((await m.agent.get(r.urls.pdf).buffer(true).parse(binary).expect(200)).body as Buffer));
    perJob.push({ id, originals, annotations, reports: reports.map((r) => ({ sha256: r.sha256, fingerprint: r.fingerprint })), pdfs });
  }
  return { jobs, perJob };
}

/**
 * Backup → wipe → restore onto a fresh folder. Storage (the uploads folder, or the bucket with
 * TEST_STORAGE=s3) outlives the machine; the database folder does not.
 */
describe('backups: a restore onto a fresh folder brings the shop back', () => {
  const keep = mkdtempSync(join(tmpdir(), 'benchproof-keep-'));
  let fake: S3Fake | null = null;
  let storageEnv: Record<string, string>;
  let b: TestApp | null = null;
  beforeAll(async () => {
    fake = ON_S3 ? await startS3Fake(join(keep, 's3')) : null;
    storageEnv = fake ? fake.env : { UPLOADS_DIR: join(keep, 'uploads') };
  });
  afterAll(async () => {
    await b?.close();
    await fake?.close();
    rmSync(keep, { recursive: true, force: true });
  });

  it('restores jobs, media, annotations and issued reports with matching SHA-256, and reports still verify', async () => {
    const a = await startTestApp(storageEnv, { s3: fake ?? undefined });
    const ctx = await jobWithRecords(a, 2);
    await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202);
    await settled(a);
    const draft = ((await ctx.m.agent.get(`${ctx.base}/reports`).expect(200)).body as { id: number; kind: string }[]).find((r) => r.kind === 'draft')!;
    await ctx.m.agent.post(`${ctx.base}/reports/issue`).send({ draftId: draft.id }).expect(202);
    const media = (await ctx.m.agent.get(`${ctx.base}/media`).expect(200)).body as Asset[];
    await ctx.m.agent.put(`/api/annotations/${media[0].id}`).send({ baseVersion: 0, document: doc }).expect(200);
    await settled(a);
    const jobIds = ((await ctx.m.agent.get('/api/jobs?pageSize=100').expect(200)).body as { items: { id: number }[] }).items.map((j) => j.id);
    const before = await records(ctx.m, jobIds);
    expect(before.perJob.flatMap((j) => j.originals).length).toBeGreaterThan(2);
    expect(before.perJob.flatMap((j) => j.reports).length).toBeGreaterThan(0);

    const made = (await ctx.m.agent.post('/api/backups').expect(201)).body as BackupSummary;
    expect(made.files).toBeGreaterThan(2);
    const listed = (await ctx.m.agent.get('/api/backups').expect(200)).body as BackupList;
    expect(listed.backups.map((x) => x.id)).toEqual([made.id]);
    await a.close(); // wipes the database folder

    const dbPath = join(keep, 'fresh-machine', 'data', 'restored.sqlite');
    const storage = createStorage(loadConfig({ ...storageEnv, DATABASE_PATH: dbPath }));
    const result = await restoreBackup(storage, made.id, dbPath);
    expect({ missing: result.missing, mismatched: result.mismatched }).toEqual({ missing: [], mismatched: [] });

    b = await startTestApp({ ...storageEnv, DATABASE_PATH: dbPath, SEED_DEMO: 'false' }, { s3: fake ?? undefined });
    const m = await b.signIn(DEMO.manager);
    const after = await records(m, jobIds);
    expect(after).toEqual(before);
    for (const o of after.perJob.flatMap((j) => j.originals)) expect(o.served).toBe(o.recorded);
    for (const r of after.perJob.flatMap((j) => j.reports)) {
      expect((await b.http().get(`/api/verify/${r.sha256}`).expect(200)).body).toMatchObject({ issued: true });
      expect((await b.http().get(`/api/verify/${r.fingerprint}`).expect(200)).body).toMatchObject({ issued: true });
    }
  }, 240_000);

  it('refuses to restore over an existing database, and names a backup that is not there', async () => {
    const storage = createStorage(loadConfig({ ...storageEnv }));
    await expect(restoreBackup(storage, '2020-01-01t00-00-00-000z', join(keep, 'x.sqlite'))).rejects.toThrow(/No finished backup/);
    const backups = (await storage.list('backups/')).filter((o) => o.key.endsWith('/manifest.json'));
    const id = backups[0].key.split('/')[1];
    await expect(restoreBackup(storage, id, b!.cfg.DATABASE_PATH)).rejects.toThrow(/exists/);
  });
});
