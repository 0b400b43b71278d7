import { contrastRatio, WCAG_THRESHOLDS } from '@benchproof/domain';
import { fontPx, outlinePx, PALETTE, PALETTE_COLOURS, strokePx, STROKE_WIDTH_NAMES } from './palette';

// Backgrounds a mark must read on: black grime and white/bright paint (values chosen as extremes, no source).
const GRIME = '#1E1B18';
const BRIGHT_PAINT = '#F4F1EA';

describe('annotation palette', () => {
  // WCAG 2.2 SC 1.4.11 non-text contrast: 3:1 for graphical objects (W3C Recommendation 2023).
  it.each(PALETTE_COLOURS)('%s: ink and outline contrast at least 3:1, and one of them reads on grime and on bright paint', (name) => {
    const { ink, outline } = PALETTE[name];
    expect(contrastRatio(ink, outline)).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.nonText);
    for (const bg of [GRIME, BRIGHT_PAINT]) {
      expect(Math.max(contrastRatio(ink, bg), contrastRatio(outline, bg))).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.nonText);
    }
  });

  it('scales strokes with the long edge so a mark looks the same at every size', () => {
    expect(strokePx('medium', { width: 1000, height: 750 })).toBe(5);
    expect(strokePx('medium', { width: 1800, height: 2400 })).toBe(12);
    for (const w of STROKE_WIDTH_NAMES) expect(outlinePx(w, { width: 1600, height: 1200 })).toBeGreaterThan(strokePx(w, { width: 1600, height: 1200 }));
    expect(fontPx({ width: 1600, height: 1200 })).toBe(45);
  });
});
