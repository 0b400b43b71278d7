import { ExportManifestSchema, ExportTableFileSchema, type ExportTableFile } from '@benchproof/contracts';
import { binary } from '../media/media-fixtures';
import { jobWithRecords, settled } from '../reports/report-fixtures';
import { sha256 } from '../reports/pdf-readback';
import { unzipAll } from '../support/unzip';
import { DEMO, startTestApp, type TestApp } from '../test-app';

describe('data export: a shop and one customer as a zip of JSON, media, reports and a SHA-256 manifest', () => {
  let t: TestApp;
  let ctx: Awaited<ReturnType<typeof jobWithRecords>>;
  let customerId: number;
  beforeAll(async () => {
    t = await startTestApp();
    ctx = await jobWithRecords(t, 2);
    const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as { id: number };
    await settled(t);
    await ctx.m.agent.post(`${ctx.base}/reports/issue`).send({ draftId: draft.id }).expect(202);
    await settled(t);
    customerId = ((await ctx.m.agent.get(`${ctx.base}`).expect(200)).body as { customer: { id: number } }).customer.id;
  }, 120_000);
  afterAll(() => t.close());

  const download = async (path: string, who: string = DEMO.manager) => {
    const { agent } = await t.signIn(who);
    const res = await agent.get(path).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toBe('application/zip');
    return unzipAll(res.body as Buffer);
  };
  const tablesOf = (entries: { name: string; data: Buffer }[]) =>
    new Map(
      entries
        .filter((e) => e.name.startsWith('data/'))
        .map((e) => {
          const file: ExportTableFile = ExportTableFileSchema.parse(JSON.parse(e.data.toString('utf8')));
          return [file.table, file];
        }),
    );

  it("lists every file in the manifest with its size and SHA-256, originals match the recorded SHA-256, and nothing of another shop's is in it", async () => {
    const entries = await download('/api/shop/export');
    expect(entries.at(-1)!.name).toBe('manifest.json');
    const manifest = ExportManifestSchema.parse(JSON.parse(entries.at(-1)!.data.toString('utf8')));
    const files = entries.slice(0, -1);
    expect(manifest.files.map((f) => f.path)).toEqual(files.map((e) => e.name));
    for (const [i, e] of files.entries()) expect(manifest.files[i]).toEqual({ path: e.name, bytes: e.data.length, sha256: sha256(e.data) });

    const tables = tablesOf(entries);
    expect([...tables.keys()]).toEqual(
      expect.arrayContaining(['customers', 'bikes', 'jobs', 'measurements', 'findings', 'decisions', 'consents', 'audit_events', 'reports', 'media_assets']),
    );
    for (const file of tables.values()) for (const row of file.rows) if ('shop_id' in row) expect(row.shop_id).toBe(manifest.shopId);
    expect(JSON.stringify([...tables.values()])).not.toMatch(/password_hash|token_hash/);

    const assets = tables.get('media_assets')!.rows.filter((r) => r.original_key !== null);
    const media = files.filter((e) => e.name.startsWith('media/'));
    expect(media.map((e) => sha256(e.data)).sort()).toEqual(assets.map((a) => a.sha256).sort());
    const issued = tables.get('reports')!.rows.filter((r) => r.kind === 'issued');
    expect(issued.length).toBeGreaterThan(0);
    expect(files.filter((e) => e.name.startsWith('reports/')).map((e) => sha256(e.data))).toEqual(issued.map((r) => r.sha256));
  });

  it("gives desk one customer's own data: that customer, their bikes and jobs, their media and reports only", async () => {
    const entries = await download(`/api/customers/${customerId}/export`, DEMO.desk);
    const tables = tablesOf(entries);
    expect(tables.get('customers')!.rows.map((r) => r.id)).toEqual([customerId]);
    expect(new Set(tables.get('jobs')!.rows.map((r) => r.customer_id))).toEqual(new Set([customerId]));
    const jobIds = new Set(tables.get('jobs')!.rows.map((r) => r.id));
    for (const name of ['findings', 'media_assets', 'reports', 'consents'])
      for (const r of tables.get(name)?.rows ?? []) expect(jobIds.has(r.job_id)).toBe(true);
    expect(tables.has('users')).toBe(false);
    const media = entries.filter((e) => e.name.startsWith('media/'));
    expect(media.length).toBe(tables.get('media_assets')!.rows.filter((r) => r.original_key !== null).length);
    expect(media.length).toBeGreaterThan(0);
  });

  it('refuses a mechanic, and answers 404 for a customer of another shop', async () => {
    const mech = await t.signIn(DEMO.mechanic);
    expect((await mech.agent.get('/api/shop/export').expect(403)).body.code).toBe('FORBIDDEN');
    const other = await t.signIn(DEMO.otherShopManager);
    expect((await other.agent.get(`/api/customers/${customerId}/export`).expect(404)).body.code).toBe('NOT_FOUND');
  });
});
