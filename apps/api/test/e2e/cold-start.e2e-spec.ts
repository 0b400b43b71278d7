import { DEMO_PASSWORD } from '@benchproof/seeds';
import { binary, CLIP_MP4 } from '../media/media-fixtures';
import { pdfPages } from '../reports/pdf-readback';
import { jobWithRecords, settled } from '../reports/report-fixtures';
import { bearer } from '../support/sessions';
import { jobForTexter } from '../texts/text-fixtures';
import { DEMO, startTestApp, type TestApp } from '../test-app';

interface ReportBody {
  id: number;
  state: string;
  urls: { pdf: string };
}

/**
 * The PDF renderer (react-pdf, its fonts, the QR encoder) and the video parser (mediainfo.js and its wasm)
 * load on first use, not at boot (DEVELOPERS.md, memory). Here a freshly started app meets both for the
 * first time — two reports asked for at once, so two renders race to load the renderer, and a video —
 * and so do the password strength lists (zxcvbn-ts) and the phone-number metadata (libphonenumber-js).
 */
describe('parts loaded on first use work in a freshly started app', { timeout: 120_000 }, () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('the first video uploaded is parsed: frame size and length are read', async () => {
    const { m, job } = await jobWithRecords(t, 0);
    const res = await m.agent
      .post(`/api/jobs/${job.id}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .attach('files', CLIP_MP4.bytes, 'clip.mp4')
      .expect(201);
    expect(res.body.assets[0]).toMatchObject({ mime: 'video/mp4', width: CLIP_MP4.width, height: CLIP_MP4.height, durationMs: CLIP_MP4.durationMs });
  });

  it('the first two reports, asked for at once, both render to readable PDFs', async () => {
    const ctx = await jobWithRecords(t, 1);
    const drafts = await Promise.all([1, 2].map(async () => (await ctx.m.agent.post(`${ctx.base}/reports/drafts`).expect(202)).body as ReportBody));
    await settled(t);
    for (const d of drafts) {
      const ready = (await ctx.m.agent.get(`${ctx.base}/reports/${d.id}`).expect(200)).body as ReportBody;
      expect(ready.state).toBe('ready');
      const pdf = (await ctx.m.agent.get(ready.urls.pdf).buffer(true).parse(binary).expect(200)).body as Buffer;
      expect((await pdfPages(pdf)).map((p) => p.text).join(' ')).toContain('Draft — not issued');
    }
  });

  it('the first password change is checked for strength: a common one is refused, a strong one accepted', async () => {
    const jwt = await bearer(t, DEMO.mechanic);
    const asked = (newPassword: string) =>
      t.http().post('/api/auth/password').set('Authorization', `Bearer ${jwt}`).send({ currentPassword: DEMO_PASSWORD, newPassword });
    expect((await asked('password123').expect(422)).body.code).toBe('WEAK_PASSWORD');
    await asked('violet-ferry-tandem-42').expect(200);
  });

  it('the first phone number typed is read with the shop country and stored in international form', async () => {
    // The demo shop is in GB; 020 7946 is London's drama range (Ofcom, from memory).
    const { customer } = await jobForTexter(await t.signIn(DEMO.desk), '020 7946 0999');
    expect(customer.phone).toBe('+442079460999');
  });
});
