import { formatDate, formatTorque } from '@benchproof/domain';
import { writeFileSync } from 'node:fs';
import { binary } from '../media/media-fixtures';
import { FINDINGS, OWNER, jobWithRecords, photo, settled } from '../reports/report-fixtures';
import { pdffonts, pdfimages, pdfPages, sha256 } from '../reports/pdf-readback';
import { startTestApp, type TestApp } from '../test-app';

interface ReportBody {
  id: number;
  state: string;
  kind: string;
  version: number | null;
  sha256: string;
  fingerprint: string | null;
  pageSize: string;
  byteSize: number;
  pageCount: number | null;
  urls: { pdf: string };
}

describe('bench report: draft, issue, read back', () => {
  let t: TestApp;
  let ctx: Awaited<ReturnType<typeof jobWithRecords>>;
  let issued: ReportBody;
  let pdf: Buffer;

  beforeAll(async () => {
    // No mail server here: the paid job's receipt gets one attempt, so no retry keeps the task wait (settled) open.
    t = await startTestApp({ MAIL_MAX_ATTEMPTS: '1' });
    ctx = await jobWithRecords(t, 3);
  });
  afterAll(() => t.close());

  const getPdf = async (url: string) => (await ctx.m.agent.get(url).buffer(true).parse(binary).expect(200)).body as Buffer;

  it('renders a draft in the background (202 at once), then issues it as version 1', async () => {
    const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
    expect(draft).toMatchObject({ kind: 'draft', state: 'rendering', version: null });
    await settled(t);
    const ready = (await ctx.m.agent.get(`${ctx.base}/reports/${draft.id}`).expect(200)).body as ReportBody;
    expect(ready.state).toBe('ready');
    const draftPdf = await getPdf(ready.urls.pdf);
    expect(sha256(draftPdf)).toBe(ready.sha256);
    expect((await pdfPages(draftPdf)).map((p) => p.text).join(' ')).toContain('Draft — not issued');

    await ctx.m.agent.post(`${ctx.base}/reports/issue`).send({ draftId: draft.id }).expect(202);
    await settled(t);
    const list = (await ctx.m.agent.get(`${ctx.base}/reports`).expect(200)).body as ReportBody[];
    issued = list.find((r) => r.kind === 'issued')!;
    expect(issued).toMatchObject({ version: 1, state: 'ready', pageSize: 'A4' });
    pdf = await getPdf(issued.urls.pdf);
    // For looking at the pages: REPORT_PDF_OUT=/tmp/r.pdf, then pdftoppm -png.
    if (process.env.REPORT_PDF_OUT) writeFileSync(process.env.REPORT_PDF_OUT, pdf);
    expect(sha256(pdf)).toBe(issued.sha256);
    expect(pdf.length).toBe(issued.byteSize);
    // The stored page count (pdf-lib, at render) agrees with Mozilla's reader on the served file.
    const readBack = (await pdfPages(pdf)).length;
    expect(readBack).toBeGreaterThan(1);
    expect(issued.pageCount).toBe(readBack);
  });

  it('shows job number, owner (ő, ł, ş), each finding, totals and the safety cautions', async () => {
    const pages = await pdfPages(pdf);
    const all = pages.map((p) => p.text).join(' ');
    expect(all).toContain(ctx.job.number);
    expect(all).toContain(OWNER);
    expect(all).toContain(FINDINGS.brake);
    expect(all).toContain(FINDINGS.chain);
    expect(all).toContain('Brakes');
    expect(all).toContain('Drivetrain');
    // Approved: chain 34.99 + 0.25 h labour; declined: the brake work. Shop currency and tax from the demo settings.
    expect(all).toMatch(/Approved \(incl\. tax\)/);
    expect(all).toContain('Declined safety work');
    expect(all).toContain('You chose not to have this work done');
    expect(all).toContain('Do not ride');
    expect(all).toContain('Do not ride if a brake lever reaches the handlebar');
    // Nothing paid yet: the cover says what is due (no "paid").
    expect(pages[0].text).toMatch(/PAYMENT\s+Due £\d+\.\d{2}/);
    expect(pages[0].text).not.toContain('Paid');
    // Job number and "Page n of N" on every page after the cover.
    pages.slice(1).forEach((p, i) => {
      expect(p.text).toContain(`Job ${ctx.job.number}`);
      expect(p.text).toContain(`Page ${i + 2} of ${pages.length}`);
    });
    // The last page carries the fingerprint and the verify link.
    // The 64 hex characters may be split into several text runs; compare without spaces.
    expect(pages.at(-1)!.text.replace(/\s/g, '')).toContain(issued.fingerprint!);
    expect(pages.at(-1)!.text).toContain(`/verify?c=${issued.fingerprint!.slice(0, 16)}`);
  });

  it('is A4 within ±1 pt (ISO 216: 210 × 297 mm = 595.28 × 841.89 pt)', async () => {
    for (const p of await pdfPages(pdf)) {
      expect(Math.abs(p.width - 595.28)).toBeLessThanOrEqual(1);
      expect(Math.abs(p.height - 841.89)).toBeLessThanOrEqual(1);
    }
  });

  it('embeds every font (pdffonts: emb = yes; no fallback to a standard font)', () => {
    const fonts = pdffonts(pdf);
    expect(fonts.length).toBeGreaterThan(0);
    for (const f of fonts) {
      expect(f).toMatchObject({ embedded: true });
      expect(f.name).toMatch(/Inter/);
    }
  });

  it('embeds the print derivatives byte for byte (pdfimages -all SHA-256 = derivative SHA-256) at their pixel size', async () => {
    const images = pdfimages(pdf);
    const expected = [];
    for (const id of ctx.shots) {
      const bytes = (await ctx.m.agent.get(`/api/media/${id}/print`).buffer(true).parse(binary).expect(200)).body as Buffer;
      expected.push(sha256(bytes));
    }
    expect(images.every((i) => i.ext === 'jpg')).toBe(true);
    expect(new Set(images.map((i) => i.sha256))).toEqual(new Set(expected));
    // 1600 × 1200 photos → 1000 × 750 print derivatives; the 1280 × 720 scope still → 1000 × 563.
    expect(images.map((i) => `${i.width}x${i.height}`).sort()).toEqual(['1000x563', '1000x750', '1000x750', '1000x750']);
  });

  it('issued versions are kept: re-issuing makes version 2 with its own hash, version 1 unchanged', async () => {
    const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
    await settled(t);
    await ctx.m.agent.post(`${ctx.base}/reports/issue`).send({ draftId: draft.id }).expect(202);
    await settled(t);
    const list = (await ctx.m.agent.get(`${ctx.base}/reports`).expect(200)).body as ReportBody[];
    const versions = list
      .filter((r) => r.kind === 'issued')
      .map((r) => r.version)
      .sort();
    expect(versions).toEqual([1, 2]);
    const v1 = list.find((r) => r.version === 1)!;
    expect(v1.sha256).toBe(issued.sha256);
    expect(sha256(await getPdf(v1.urls.pdf))).toBe(issued.sha256);
    expect(list.find((r) => r.version === 2)!.sha256).not.toBe(issued.sha256);
  });

  it('verify: the genuine file hash and the printed fingerprint verify; one changed byte does not', async () => {
    const ok = (
      await t
        .http()
        .get(`/api/verify/${sha256(pdf)}`)
        .expect(200)
    ).body;
    expect(ok).toEqual({ issued: true, shopName: expect.any(String), jobNumber: ctx.job.number, version: 1, issuedAt: expect.any(String) });
    expect(Object.keys(ok).sort()).toEqual(['issued', 'issuedAt', 'jobNumber', 'shopName', 'version']);
    expect((await t.http().get(`/api/verify/${issued.fingerprint}`).expect(200)).body).toMatchObject({ issued: true, version: 1 });
    expect(
      (
        await t
          .http()
          .get(`/api/verify/${issued.fingerprint!.slice(0, 16)}`)
          .expect(200)
      ).body,
    ).toMatchObject({ issued: true, version: 1 });
    const tampered = Buffer.from(pdf);
    tampered[Math.floor(tampered.length / 2)] ^= 0x01;
    expect(
      (
        await t
          .http()
          .get(`/api/verify/${sha256(tampered)}`)
          .expect(200)
      ).body,
    ).toEqual({ issued: false });
    await t.http().get('/api/verify/not-a-hash').expect(400);
  });

  it('a paid job: the report made after the payment says "Paid" with the day, written as the shop writes dates', async () => {
    const due = ((await ctx.m.agent.get(`${ctx.base}/payments`).expect(200)).body as { balance: { dueMinor: number } }).balance.dueMinor;
    expect(due).toBeGreaterThan(0);
    await ctx.m.agent.post(`${ctx.base}/payments`).send({ method: 'cash', amountMinor: due }).expect(201);
    const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
    await settled(t);
    const ready = (await ctx.m.agent.get(`${ctx.base}/reports/${draft.id}`).expect(200)).body as ReportBody;
    const paidPdf = await getPdf(ready.urls.pdf);
    if (process.env.REPORT_PAID_PDF_OUT) writeFileSync(process.env.REPORT_PAID_PDF_OUT, paidPdf);
    const cover = (await pdfPages(paidPdf))[0].text;
    // The demo shop writes dates en-GB: day, short month, year (CLDR via formatDate, tested in libs/domain).
    expect(cover).toMatch(/PAYMENT\s+Paid \d{1,2} [A-Z][a-z]{2} \d{4}/);
    expect(cover).toContain(`Paid ${formatDate(new Date(), 'en-GB', { timeZone: 'UTC' })}`);
    expect(cover).not.toMatch(/Due £/);
  });

  it('a draft cannot be verified, and a draft still rendering cannot be issued', async () => {
    const list = (await ctx.m.agent.get(`${ctx.base}/reports`).expect(200)).body as ReportBody[];
    const draft = list.find((r) => r.kind === 'draft')!;
    expect((await t.http().get(`/api/verify/${draft.sha256}`).expect(200)).body).toEqual({ issued: false });
    const pending = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
    const res = await ctx.m.agent.post(`${ctx.base}/reports/issue`).send({ draftId: pending.id });
    if (res.status !== 202) expect(res.body.code).toBe('REPORT_NOT_READY');
    await settled(t);
  });

  it('prints the before/after pairs of the job with the pair caption and both shot captions', async () => {
    const after = await ctx.m.agent
      .post(`${ctx.base}/media`)
      .field('phase', 'after')
      .field('area', 'brakes')
      .field('caption', 'Pads after fitting')
      .attach('files', await photo(7), { filename: 'after.jpg', contentType: 'image/jpeg' })
      .expect(201);
    const afterId = (after.body as { results: { asset: { id: number } }[] }).results[0].asset.id;
    await settled(t);
    await ctx.m.agent
      .post(`${ctx.base}/pairs`)
      .send({ beforeAssetId: ctx.shots[0], afterAssetId: afterId, caption: 'Front brake: glazed pads, then new pads bedded in' })
      .expect(201);
    const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
    await settled(t);
    const ready = (await ctx.m.agent.get(`${ctx.base}/reports/${draft.id}`).expect(200)).body as ReportBody;
    const text = (await pdfPages(await getPdf(ready.urls.pdf)))
      .map((p) => p.text)
      .join(' ')
      .replace(/\s+/g, ' ');
    for (const caption of ['Front brake: glazed pads, then new pads bedded in', 'Pads after fitting', 'Shot 1']) expect(text).toContain(caption);
  });

  // The shop's units setting picks the unit a length is typed in; the web then shows every reading and torque
  // in the unit it was recorded in, and the report must show the very same text (no second conversion on paper).
  it('in an imperial shop, prints each measurement and torque exactly as the web shows it', async () => {
    await ctx.m.agent.patch('/api/shop/settings').send({ units: 'imperial' }).expect(200);
    try {
      const insp = (await ctx.m.agent.get(`${ctx.base}/inspection`).expect(200)).body as { areas: { checkpoints: { key: string; id: number }[] }[] };
      const cp = insp.areas.flatMap((a) => a.checkpoints).find((c) => c.key === 'chain_wear')!.id;
      const measured = (
        await ctx.m.agent
          .post(`${ctx.base}/checkpoints/${cp}/measurements`)
          .send({ kind: 'chain_elongation', method: 'ruler', pitches: 24, lengthValue: 12.1, lengthUnit: 'in' })
          .expect(201)
      ).body as { result: { message: string } };
      await ctx.m.agent
        .post(`${ctx.base}/torque-entries`)
        .send({
          fastener: 'Seat clamp bolt',
          specified: { min: 44, max: null, unit: 'lbf_in' },
          applied: { value: 44, unit: 'lbf_in' },
          specSource: "Component maker's printed value",
          tool: 'Click wrench 20–100 lbf·in',
          toolCalibratedOn: '2025-06-01',
        })
        .expect(201);
      const draft = (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody;
      await settled(t);
      const ready = (await ctx.m.agent.get(`${ctx.base}/reports/${draft.id}`).expect(200)).body as ReportBody;
      const text = (await pdfPages(await getPdf(ready.urls.pdf))).map((p) => p.text.replace(/\s+/g, ' ')).join(' ');
      // The web's checkpoint card prints result.message (the ruler's inches become a %); its torque list prints formatTorque(value, unit).
      expect(text).toContain(measured.result.message);
      expect(text).toContain(formatTorque(44, 'lbf_in'));
      expect(text).toContain(formatTorque(5, 'nm'));
    } finally {
      await ctx.m.agent.patch('/api/shop/settings').send({ units: 'metric' }).expect(200);
    }
  });
});
