import type { ImportPreview, ImportSummary } from '@benchproof/contracts';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { REPO_ROOT } from '../../src/config';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const SAMPLE = readFileSync(resolve(REPO_ROOT, 'apps/web/public/customers-import-sample.csv'), 'utf8');

/** Good rows, rows with problems and duplicates, as a spreadsheet would save them (semicolons, quotes, a BOM). */
const MIXED = [
  '\uFEFFCustomer;E-mail address;Mobile;Brand;Model;Frame;Gears;Brakes',
  'Della Marsh;della@example.test;07700 900301;Ridgeline;Tourer 2;steel;9;rim',
  ';nobody@example.test;;Ridgeline;Tourer 2;steel;9;rim',
  'Evan Pike;not-an-email;;;;;;',
  'Fay Holm;fay@example.test;;Hillcrest;City 7;bamboo-ish;7;rim',
  'Della M.;DELLA@example.test;;Vantail;Sprint SL;carbon;12;hydraulic',
  'Gus Ferrer;;+44 7700 900301;;;;;',
  'Hal Odum;hal@example.test;;Vantail;;carbon;;disc',
].join('\r\n');

describe('CSV import of customers and bikes', () => {
  let t: TestApp;
  let manager: SignedIn;
  beforeAll(async () => {
    t = await startTestApp();
    manager = await t.signIn(DEMO.manager);
  });
  afterAll(() => t.close());

  const customerCount = async (who: SignedIn) => ((await who.agent.get('/api/customers?pageSize=1').expect(200)).body as { total: number }).total;

  it('previews every row with its problems and matches, writing nothing', async () => {
    const before = await customerCount(manager);
    const preview = (await manager.agent.post('/api/imports/customers/preview').send({ csv: MIXED }).expect(200)).body as ImportPreview;
    expect(preview.columns).toEqual(['Customer', 'E-mail address', 'Mobile', 'Brand', 'Model', 'Frame', 'Gears', 'Brakes']);
    expect(preview.mapping).toEqual({
      Customer: 'customer.name',
      'E-mail address': 'customer.email',
      Mobile: 'customer.phone',
      Brand: 'bike.maker',
      Model: 'bike.model',
      Frame: 'bike.frameMaterial',
      Gears: 'bike.drivetrainSpeeds',
      Brakes: 'bike.brakeType',
    });
    const byLine = new Map(preview.rows.map((r) => [r.line, r]));
    expect(byLine.get(2)).toMatchObject({ customerName: 'Della Marsh', bikeLabel: 'Ridgeline Tourer 2', customer: { kind: 'new' }, problems: [] });
    expect(byLine.get(3)?.problems).toEqual([{ field: 'customer.name', message: 'The owner’s name is missing' }]);
    expect(byLine.get(4)?.problems.map((p) => p.field)).toEqual(['customer.email']);
    expect(byLine.get(5)?.problems).toEqual([{ field: 'bike.frameMaterial', message: expect.stringContaining('bamboo-ish') }]);
    // Same e-mail (other case) and same phone (other format) as line 2: matched, not a second customer.
    expect(byLine.get(6)).toMatchObject({ customer: { kind: 'existing', name: 'Della Marsh' }, problems: [] });
    expect(byLine.get(7)).toMatchObject({ customer: { kind: 'existing', name: 'Della Marsh' }, bikeLabel: null, problems: [] });
    expect(
      byLine
        .get(8)
        ?.problems.map((p) => p.field)
        .sort(),
    ).toEqual(['bike.drivetrainSpeeds', 'bike.model']);
    expect(preview.counts).toEqual({ rows: 7, valid: 3, withProblems: 4, newCustomers: 1, matchedCustomers: 2, bikes: 2 });
    expect(await customerCount(manager)).toBe(before);
  });

  it('imports exactly the good rows in one go, and matches an existing customer on a second run', async () => {
    const before = await customerCount(manager);
    const summary = (await manager.agent.post('/api/imports/customers').send({ csv: MIXED }).expect(201)).body as ImportSummary;
    expect(summary).toEqual({ customersCreated: 1, customersMatched: 2, bikesCreated: 2, rowsSkipped: 4, skippedLines: [3, 4, 5, 8] });
    expect(await customerCount(manager)).toBe(before + 1);
    const found = (await manager.agent.get('/api/customers?q=Della').expect(200)).body as { items: Array<{ id: number; name: string }> };
    expect(found.items.map((c) => c.name)).toEqual(['Della Marsh']);
    const bikes = (await manager.agent.get(`/api/customers/${found.items[0].id}/bikes`).expect(200)).body as Array<{
      maker: string;
      frameMaterial: string;
      brakeType: string;
    }>;
    expect(bikes.map((b) => [b.maker, b.frameMaterial, b.brakeType]).sort()).toEqual([
      ['Ridgeline', 'steel', 'rim'],
      ['Vantail', 'carbon', 'hydraulic_disc'],
    ]);
    const again = (await manager.agent.post('/api/imports/customers/preview').send({ csv: MIXED }).expect(200)).body as ImportPreview;
    expect(again.rows.find((r) => r.line === 2)?.customer).toEqual({ kind: 'existing', id: found.items[0].id, name: 'Della Marsh' });
  });

  it('reads the sample file in the repo without a problem, with a manager’s own mapping', async () => {
    const preview = (await manager.agent.post('/api/imports/customers/preview').send({ csv: SAMPLE }).expect(200)).body as ImportPreview;
    expect(preview.rows.filter((r) => r.problems.length)).toEqual([]);
    expect(preview.counts).toMatchObject({ rows: 4, valid: 4, newCustomers: 3, matchedCustomers: 1, bikes: 4 });
    const noNotes = { ...preview.mapping, Notes: '', Phone: '' } as const;
    const mapped = (await manager.agent.post('/api/imports/customers/preview').send({ csv: SAMPLE, mapping: noNotes }).expect(200)).body as ImportPreview;
    // Without the phone column, the owner with only a phone has no way to be reached.
    expect(mapped.rows.find((r) => r.customerName === 'Bram Oduya')?.problems[0]?.field).toBe('customer.phone');
  });

  it('stores a formula-like cell as plain text and never exports it back as a formula', async () => {
    const csv = `Name,Email,Notes\n"=cmd|' /C calc'!A0",formula@example.test,"@SUM(1+1)"\n`;
    await manager.agent.post('/api/imports/customers').send({ csv }).expect(201);
    const found = (await manager.agent.get('/api/customers?q=formula').expect(200)).body as { items: Array<{ name: string; notes: string | null }> };
    expect(found.items[0]).toMatchObject({ name: "=cmd|' /C calc'!A0", notes: '@SUM(1+1)' });
    const exported = await manager.agent.get('/api/imports/customers.csv').expect(200);
    expect(exported.headers['content-type']).toContain('text/csv');
    const line = exported.text.split('\r\n').find((l) => l.includes('formula@example.test'))!;
    expect(line).toBe(`"'=cmd|' /C calc'!A0","formula@example.test","","'@SUM(1+1)"`);
    // No cell of the export starts with a character a spreadsheet would evaluate.
    for (const cell of exported.text.split(/\r\n|,/)) expect(cell.replace(/^"/, '')).not.toMatch(/^[=+\-@]/);
  });

  it('is for managers, and scoped to the shop', async () => {
    const desk = await t.signIn(DEMO.desk);
    await desk.agent.post('/api/imports/customers/preview').send({ csv: SAMPLE }).expect(403);
    await desk.agent.get('/api/imports/customers.csv').expect(403);
    const other = await t.signIn(DEMO.otherShopManager);
    const preview = (await other.agent.post('/api/imports/customers/preview').send({ csv: MIXED }).expect(200)).body as ImportPreview;
    // Della Marsh belongs to the other shop: here she is new.
    expect(preview.rows.find((r) => r.line === 2)?.customer).toEqual({ kind: 'new' });
    expect((await other.agent.get('/api/imports/customers.csv').expect(200)).text).not.toContain('della@example.test');
  });
});
