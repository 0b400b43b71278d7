import { binary, CLIP_MP4 } from '../media/media-fixtures';
import { pdfPages } from '../reports/pdf-readback';
import { jobWithRecords, settled } from '../reports/report-fixtures';
import { startTestApp, type TestApp } from '../test-app';

interface ReportBody {
  id: number;
  state: string;
  urls: { pdf: string };
}

/**
 * The PDF renderer (react-pdf, its fonts, the QR encoder) and the video parser (mediainfo.js and its wasm)
 * load on first use, not at boot (DEVELOPERS.md, memory). Here a freshly started app meets both for the
 * first time — two reports asked for at once, so two renders race to load the renderer, and a video.
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
});
