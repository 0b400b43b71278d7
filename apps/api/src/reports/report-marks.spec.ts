import { GENERAL_SAFETY, reportPalette, type Condition } from '@benchproof/domain';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createElement } from 'react';
import sharp from 'sharp';
import { PdfAdapter } from '../infra/pdf';
import { ReportDocument } from './pdf/report.pdf';
import { CONDITION_MARK } from './pdf/theme';
import type { ReportSnapshot } from './report-data';

const DPI = 150;
const CONDITIONS: Condition[] = ['sound', 'wearing', 'worn', 'unsafe'];

/** Invented shop and owner; one finding per condition, a torque line, no work log. */
function snapshot(): ReportSnapshot {
  return {
    schemaVersion: 1,
    shop: {
      name: 'Quarry Lane Cycles',
      contact: '1 Quarry Lane',
      footer: '',
      palette: reportPalette('#1F5F5B', '#E0A526'),
      logoKey: null,
      units: 'metric',
      currency: 'GBP',
    },
    job: {
      id: 1,
      number: 'J-2026-0778',
      bookedAt: '2026-11-30T09:00:00.000Z',
      readyAt: null,
      promisedOn: '2026-12-03',
      symptoms: 'Noisy.',
      mechanic: 'Ines Marlow',
    },
    owner: { name: 'Dora Vell' },
    bike: { title: 'Vantor Trail', detail: '2021', serial: null },
    overall: 'unsafe',
    findings: CONDITIONS.map((condition, i) => ({
      id: i + 1,
      title: `Finding ${condition}`,
      condition,
      description: 'Seen on the stand.',
      doNotRide: false,
      cautions: [],
      shots: [],
    })),
    measurements: [],
    torque: [{ fastener: 'Stem clamp', specified: '5.0 N·m', applied: '5.0 N·m', verdict: 'within', source: 'Maker', tool: 'TW-1', calibratedOn: null }],
    work: [],
    recommendations: [],
    totals: { approvedMinor: 0, declinedMinor: 0, pendingMinor: 0, taxMinor: 0 },
    scopeStills: [],
    pairs: [{ before: { assetId: 7, caption: 'Pads before' }, after: { assetId: 8, caption: 'New pads fitted' }, caption: 'Brake pads' }],
    finalCheck: null,
    cautions: [GENERAL_SAFETY],
    madeAt: '2026-12-01T10:00:00.000Z',
  };
}

interface Blob {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Connected regions (8-neighbour) of pixels within `tol` of `hex`, on one page image. */
async function blobs(png: Buffer, hex: string, tol = 60): Promise<Blob[]> {
  const { data, info } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
  const W = info.width;
  const H = info.height;
  const mask = new Uint8Array(W * H);
  for (let p = 0; p < W * H; p++) {
    const o = p * 3;
    if (Math.abs(data[o] - r) + Math.abs(data[o + 1] - g) + Math.abs(data[o + 2] - b) < tol) mask[p] = 1;
  }
  const out: Blob[] = [];
  const stack: number[] = [];
  for (let p = 0; p < W * H; p++) {
    if (mask[p] !== 1) continue;
    const blob = { x0: W, y0: H, x1: 0, y1: 0 };
    mask[p] = 2;
    stack.push(p);
    while (stack.length) {
      const q = stack.pop()!;
      const x = q % W;
      const y = (q - x) / W;
      blob.x0 = Math.min(blob.x0, x);
      blob.x1 = Math.max(blob.x1, x);
      blob.y0 = Math.min(blob.y0, y);
      blob.y1 = Math.max(blob.y1, y);
      for (let dy = -1; dy <= 1; dy++)
        for (let dx = -1; dx <= 1; dx++) {
          const nx = x + dx;
          const ny = y + dy;
          if (nx < 0 || ny < 0 || nx >= W || ny >= H) continue;
          const n = ny * W + nx;
          if (mask[n] === 1) {
            mask[n] = 2;
            stack.push(n);
          }
        }
    }
    out.push(blob);
  }
  return out;
}

/**
 * Every condition mark on a page: an icon (a near-square blob of 8–12 pt) and the words in the same
 * colour right of it on the same line. Returns the icon's vertical centre and the words' ink centre.
 */
async function marks(png: Buffer, hex: string): Promise<{ icon: number; words: number; x: number; y: number }[]> {
  const all = await blobs(png, hex);
  const px = (pt: number) => (pt * DPI) / 72;
  // Icons are 8–12 pt; a 10 pt capital is about 7.3 pt tall, and a glyph has a letter of its word just left of it.
  const icons = all.filter((b) => {
    const w = b.x1 - b.x0 + 1;
    const h = b.y1 - b.y0 + 1;
    const square = w >= px(7.7) && w <= px(13) && h >= px(7.7) && h <= px(13) && Math.abs(w - h) <= px(2);
    return square && !all.some((o) => o !== b && o.x1 < b.x0 && b.x0 - o.x1 < px(3) && o.y1 > b.y0 && o.y0 < b.y1);
  });
  return icons.flatMap((icon) => {
    const mid = (icon.y0 + icon.y1) / 2;
    const glyphs = all.filter(
      (b) => b !== icon && b.x0 > icon.x1 && b.x0 - icon.x1 < px(60) && Math.abs((b.y0 + b.y1) / 2 - mid) < px(14) && b.y1 - b.y0 > px(3),
    );
    if (!glyphs.length) return [];
    // The words' line: the band from the tallest glyph's top to the common baseline (descenders ignored: the most common bottom).
    const bottoms = glyphs.map((g) => g.y1).sort((a, b) => a - b);
    const baseline = bottoms[Math.floor(bottoms.length / 2)];
    const top = Math.min(...glyphs.map((g) => g.y0));
    return [{ icon: mid, words: (top + baseline) / 2, x: icon.x0, y: icon.y0 }];
  });
}

function pages(pdf: Buffer): Buffer[] {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-marks-'));
  try {
    writeFileSync(join(dir, 'r.pdf'), pdf);
    execFileSync('pdftoppm', ['-png', '-r', String(DPI), join(dir, 'r.pdf'), join(dir, 'p')]);
    return readdirSync(dir)
      .filter((f) => f.endsWith('.png'))
      .sort()
      .map((f) => readFileSync(join(dir, f)));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('PDF condition marks sit on their words’ line (pdftoppm at 150 dpi, pixels measured)', { timeout: 60_000 }, () => {
  let rendered: Buffer;
  beforeAll(async () => {
    const img = await sharp({ create: { width: 1000, height: 750, channels: 3, background: '#556677' } })
      .jpeg()
      .toBuffer();
    const images = new Map([7, 8].map((id) => [id, { data: img, width: 1000, height: 750 }]));
    rendered = await new PdfAdapter().render(createElement(ReportDocument, { snap: snapshot(), pageSize: 'A4', images, logo: null, stamp: null }));
    if (process.env.REPORT_PDF_OUT) writeFileSync(process.env.REPORT_PDF_OUT, rendered);
  });

  it('every icon’s centre is within 0.75 pt of its words’ centre, in the summary, the key and the findings', async () => {
    const found: { condition: Condition; page: number; off: number }[] = [];
    for (const [page, png] of pages(rendered).entries()) {
      for (const condition of CONDITIONS) {
        for (const m of await marks(png, CONDITION_MARK[condition].colour)) found.push({ condition, page: page + 1, off: ((m.icon - m.words) * 72) / DPI });
      }
    }
    // Summary (4 findings), key (4), findings headers (4): at least 12 marks, each colour seen.
    expect(found.length).toBeGreaterThanOrEqual(12);
    expect(new Set(found.map((f) => f.condition)).size).toBe(4);
    const misaligned = found.filter((f) => Math.abs(f.off) > 0.75).map((f) => `${f.condition} p${f.page}: ${f.off.toFixed(1)} pt`);
    expect(misaligned).toEqual([]);
  });

  it('without a work log, the summary says what the after photos show instead of "No work recorded yet"', () => {
    const text = execFileSync('pdftotext', ['-', '-'], { input: rendered, encoding: 'utf8' });
    expect(text).not.toContain('No work recorded yet');
    expect(text).toMatch(/What we did\s+The after photos under “Before and after” show the parts as we left them\./);
  });

  it('without a work log and without pairs, the summary leaves "What we did" out', async () => {
    const pdf = await new PdfAdapter().render(
      createElement(ReportDocument, { snap: { ...snapshot(), pairs: [] }, pageSize: 'A4', images: new Map(), logo: null, stamp: null }),
    );
    const text = execFileSync('pdftotext', ['-', '-'], { input: pdf, encoding: 'utf8' });
    expect(text).toContain('What we found');
    expect(text).not.toContain('What we did');
    expect(text).not.toContain('No work recorded yet');
  });
});
