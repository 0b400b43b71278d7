import { contrastRatio } from './contrast';
import { brandInk, brandSurface, reportPalette } from './report-palette';

// Worked values: CHECKS.md B.8 from W3C WCAG 2.2 "relative luminance" / "contrast ratio";
// ratios on white: #777777 4.4781, #767676 4.5422, #FF0000 3.9985, #0000FF 8.5925, #949494 3.0335.
describe('brandInk: a brand colour printed as text on white paper (SC 1.4.3, 4.5:1)', () => {
  it.each([
    { colour: '#767676', ratio: 4.5422 },
    { colour: '#0000FF', ratio: 8.5925 },
    { colour: '#595959', ratio: 7.0047 },
  ])('$colour passes at $ratio and is kept', ({ colour, ratio }) => {
    const ink = brandInk(colour);
    expect(ink.adjusted).toBe(false);
    expect(ink.used).toBe(colour);
    expect(ink.chosenRatio).toBeCloseTo(ratio, 4);
  });

  it.each([
    { colour: '#777777', ratio: 4.4781 }, // fails by 0.02: never rounded up
    { colour: '#FF0000', ratio: 3.9985 },
    { colour: '#949494', ratio: 3.0335 },
    { colour: '#E0A526', ratio: null },
    { colour: '#FFFF00', ratio: null },
  ])('$colour fails and is darkened until it reaches 4.5:1', ({ colour, ratio }) => {
    const ink = brandInk(colour);
    if (ratio !== null) expect(ink.chosenRatio).toBeCloseTo(ratio, 4);
    expect(ink.chosenRatio).toBeLessThan(4.5);
    expect(ink.adjusted).toBe(true);
    expect(ink.usedRatio).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(ink.used, '#FFFFFF')).toBe(ink.usedRatio);
    // Darkened, not swapped for black: still well short of black's 21:1.
    expect(ink.usedRatio).toBeLessThan(6);
  });

  it('#777777 needs only a small step: its first passing shade is #767676-like (L within 0.01)', () => {
    const ink = brandInk('#777777');
    expect(ink.used).toMatch(/^#7[0-6][0-9A-F]{4}$/);
  });
});

describe('brandSurface: text on a brand-coloured band is black or white, whichever contrasts more', () => {
  it.each([
    { bg: '#FF0000', text: '#000000', ratio: 5.252 }, // (0.2126 + 0.05) / 0.05
    { bg: '#0000FF', text: '#FFFFFF', ratio: 8.5925 },
    { bg: '#767676', text: '#000000', ratio: 4.6233 }, // (0.181164 + 0.05) / 0.05
    { bg: '#595959', text: '#FFFFFF', ratio: 7.0047 },
  ])('on $bg → $text at $ratio', ({ bg, text, ratio }) => {
    const s = brandSurface(bg);
    expect(s.text).toBe(text);
    expect(s.ratio).toBeCloseTo(ratio, 3);
    expect(s.ratio).toBeGreaterThanOrEqual(4.5);
  });

  it('reaches 4.5:1 for every grey and primary (black or white always does: min is about 4.58)', () => {
    for (let v = 0; v < 256; v += 5) {
      const h = v.toString(16).padStart(2, '0');
      expect(brandSurface(`#${h}${h}${h}`).ratio).toBeGreaterThanOrEqual(4.5);
    }
  });
});

describe('reportPalette', () => {
  it('keeps a dark teal primary and darkens a light amber accent for text', () => {
    const p = reportPalette('#1F5F5B', '#E0A526');
    expect(p.primary.text).toBe('#FFFFFF');
    expect(p.primaryInk.adjusted).toBe(false);
    expect(p.accent.text).toBe('#000000');
    expect(p.accentInk.adjusted).toBe(true);
  });
});
