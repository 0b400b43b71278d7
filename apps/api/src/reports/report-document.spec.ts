import { GENERAL_SAFETY, reportPalette } from '@benchproof/domain';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inflateSync } from 'node:zlib';
import { createElement } from 'react';
import sharp from 'sharp';
import { pdfPages } from '../../test/reports/pdf-readback';
import { PdfAdapter } from '../infra/pdf';
import { ReportDocument } from './pdf/report.pdf';
import type { ReportImage, ReportSnapshot } from './report-data';

/** A snapshot as the service would freeze it: invented owner and shop. */
function snapshot(over: Partial<ReportSnapshot> = {}): ReportSnapshot {
  return {
    schemaVersion: 1,
    shop: {
      name: 'Quarry Lane Cycles',
      contact: '1 Quarry Lane',
      footer: 'Re-adjustments free within 30 days.',
      palette: reportPalette('#FFD400', '#0057B8'),
      logoKey: null,
      units: 'metric',
      currency: 'EUR',
    },
    job: {
      id: 1,
      number: 'J-2026-0777',
      bookedAt: '2026-11-30T09:00:00.000Z',
      readyAt: null,
      promisedOn: '2026-12-03',
      symptoms: 'Squeaks.',
      mechanic: 'Ines Marlow',
    },
    owner: { name: 'Łucja Őry-Şenol' },
    bike: { title: 'Vantor Trail', detail: '2021', serial: null },
    overall: 'worn',
    findings: [
      {
        id: 1,
        title: 'Drivetrain',
        condition: 'worn',
        description: 'Chain stretched.',
        doNotRide: false,
        cautions: [],
        shots: [{ assetId: 7, caption: 'Chain on the gauge' }],
      },
    ],
    measurements: [],
    torque: [],
    work: [],
    recommendations: [{ findingTitle: 'Drivetrain', summary: 'Replace chain', urgency: 'soon', safety: false, status: 'approved', grossMinor: 4200 }],
    totals: { approvedMinor: 4200, declinedMinor: 0, pendingMinor: 0, taxMinor: 700 },
    scopeStills: [],
    pairs: [],
    finalCheck: null,
    cautions: [GENERAL_SAFETY],
    madeAt: '2026-12-01T10:00:00.000Z',
    ...over,
  };
}

function poppler(pdf: Buffer, tool: 'pdfinfo' | 'pdftotext'): string {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-doc-'));
  try {
    writeFileSync(join(dir, 'r.pdf'), pdf);
    return execFileSync(tool, tool === 'pdftotext' ? [join(dir, 'r.pdf'), '-'] : [join(dir, 'r.pdf')], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Every fill colour set in the PDF's (Flate-compressed) content streams, as 0..1 RGB triples. */
function fillColours(pdf: Buffer): number[][] {
  const raw = pdf.toString('latin1');
  const out: number[][] = [];
  for (const m of raw.matchAll(/stream\r?\n([\s\S]*?)endstream/g)) {
    let text: string;
    try {
      text = inflateSync(Buffer.from(m[1], 'latin1')).toString('latin1');
    } catch {
      continue;
    }
    for (const c of text.matchAll(/([\d.]+) ([\d.]+) ([\d.]+) (?:rg|scn)/g)) out.push([Number(c[1]), Number(c[2]), Number(c[3])]);
  }
  return out;
}

describe('ReportDocument (react-pdf, read back with poppler)', { timeout: 60_000 }, () => {
  const pdf = new PdfAdapter();
  let image: ReportImage;
  beforeAll(async () => {
    const data = await sharp({ create: { width: 1000, height: 750, channels: 3, background: '#556677' } })
      .jpeg()
      .toBuffer();
    image = { data, width: 1000, height: 750 };
  });

  const render = (snap: ReportSnapshot, pageSize: 'A4' | 'Letter') =>
    pdf.render(createElement(ReportDocument, { snap, pageSize, images: new Map([[7, image]]), logo: null, stamp: null }));

  it('Letter is 612 × 792 pt within ±1 (ASME Y14.1 8.5 × 11 in; pdfinfo)', async () => {
    const info = poppler(await render(snapshot(), 'Letter'), 'pdfinfo');
    const [, w, h] = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info) ?? [];
    expect(Math.abs(Number(w) - 612)).toBeLessThanOrEqual(1);
    expect(Math.abs(Number(h) - 792)).toBeLessThanOrEqual(1);
  });

  it('numbers every page and prints the job number on each, with the owner in ő, ł, ş', async () => {
    const out = await render(snapshot(), 'A4');
    const pages = poppler(out, 'pdftotext')
      .split('\f')
      .filter((p) => p.trim());
    // Page count read by a PDF library (pdfjs-dist); the adapter's own count (stored as reports.page_count) must agree.
    const readBack = (await pdfPages(out)).length;
    expect(pages.length).toBe(readBack);
    expect(await pdf.pageCount(out)).toBe(readBack);
    pages.forEach((text, i) => {
      expect(text).toContain('J-2026-0777');
      expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
    });
    expect(pages[0]).toContain('Łucja Őry-Şenol');
    expect(pages.join('')).toContain('Draft — not issued');
  });

  it('prints a too-light brand colour as the darker shade the contrast check picked', async () => {
    const snap = snapshot();
    // #FFD400 on white is far below 4.5:1; the palette darkens it for text.
    expect(snap.shop.palette.primaryInk.adjusted).toBe(true);
    const fills = fillColours(await render(snap, 'A4'));
    const near = (hex: string) => fills.some((c) => c.every((v, i) => Math.abs(v - parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255) < 0.003));
    // The cover band is still the brand colour; text on paper uses the darker shade.
    expect(near('#FFD400')).toBe(true);
    expect(near(snap.shop.palette.primaryInk.used)).toBe(true);
  });
});
