import { DomainInputError } from './errors';
import { WCAG_THRESHOLDS, contrastRatio, meetsContrast, normaliseHexColour, parseHexColour, readableTextOn, relativeLuminance } from './contrast';

// CHECKS.md B.8 worked pairs [V] (own implementation = wcag-contrast = culori.wcagContrast),
// formulas from W3C WCAG 2.2 "relative luminance" and "contrast ratio".
const WORKED = [
  { fg: '#777777', lum: 0.184475, ratio: 4.4781 },
  { fg: '#767676', lum: 0.181164, ratio: 4.5422 },
  { fg: '#595959', lum: 0.099899, ratio: 7.0047 },
  { fg: '#949494', lum: 0.296138, ratio: 3.0335 },
  { fg: '#FF0000', lum: 0.2126, ratio: 3.9985 },
  { fg: '#0000FF', lum: 0.0722, ratio: 8.5925 },
  { fg: '#000000', lum: 0, ratio: 21 },
];

describe('WCAG 2.2 relative luminance and contrast (CHECKS.md B.8)', () => {
  it.each(WORKED)('$fg on #FFFFFF: L $lum, ratio $ratio', ({ fg, lum, ratio }) => {
    expect(relativeLuminance(fg)).toBeCloseTo(lum, 6);
    expect(contrastRatio(fg, '#FFFFFF')).toBeCloseTo(ratio, 4);
  });

  it('#777777 on white is 4.478089… (wcag-contrast value quoted in CHECKS.md C)', () => {
    expect(contrastRatio('#777777', '#ffffff')).toBeCloseTo(4.478089, 6);
  });

  it('is symmetric and within [1, 21]', () => {
    const colours = ['#000000', '#FFFFFF', '#777777', '#FF0000', '#00FF00', '#0000FF', '#123456', '#FEDCBA', '#0A0A0A'];
    for (const a of colours) {
      for (const b of colours) {
        const r = contrastRatio(a, b);
        expect(r).toBe(contrastRatio(b, a));
        expect(r).toBeGreaterThanOrEqual(1);
        expect(r).toBeLessThanOrEqual(21);
      }
      expect(contrastRatio(a, a)).toBe(1);
    }
  });

  it('does not round up: 4.4781 fails AA text, passes AA large (SC 1.4.3; Understanding doc, from memory)', () => {
    expect(meetsContrast('#777777', '#FFFFFF', 'aaText')).toBe(false);
    expect(meetsContrast('#777777', '#FFFFFF', 'aaLargeText')).toBe(true);
    expect(meetsContrast('#767676', '#FFFFFF', 'aaText')).toBe(true);
    expect(meetsContrast('#595959', '#FFFFFF', 'aaaText')).toBe(true);
    expect(meetsContrast('#949494', '#FFFFFF', 'nonText')).toBe(true);
  });

  it('thresholds are those of SC 1.4.3, 1.4.6, 1.4.11', () => {
    expect(WCAG_THRESHOLDS).toEqual({ aaText: 4.5, aaLargeText: 3, aaaText: 7, aaaLargeText: 4.5, nonText: 3 });
  });
});

describe('readableTextOn: black or white, whichever contrasts more', () => {
  // With black, ratio = (L + 0.05) / 0.05; L values from CHECKS.md B.8.
  it.each([
    { bg: '#FFFFFF', text: '#000000' }, // 21 vs 1
    { bg: '#000000', text: '#FFFFFF' },
    { bg: '#FF0000', text: '#000000' }, // (0.2126 + 0.05)/0.05 = 5.252 vs 3.9985
    { bg: '#0000FF', text: '#FFFFFF' }, // (0.0722 + 0.05)/0.05 = 2.444 vs 8.5925
    { bg: '#767676', text: '#000000' }, // (0.181164 + 0.05)/0.05 = 4.6233 vs 4.5422
    { bg: '#595959', text: '#FFFFFF' }, // (0.099899 + 0.05)/0.05 = 2.998 vs 7.0047
  ])('on $bg → $text', ({ bg, text }) => {
    expect(readableTextOn(bg)).toBe(text);
  });

  it('black on #FF0000 is 5.252 (arithmetic from L = 0.2126)', () => {
    expect(contrastRatio('#FF0000', '#000000')).toBeCloseTo(5.252, 6);
  });
});

describe('hex parsing', () => {
  it('accepts #RGB, #RRGGBB, any case, hash optional', () => {
    expect(parseHexColour('#fff')).toEqual([255, 255, 255]);
    expect(parseHexColour('1a2B3c')).toEqual([26, 43, 60]);
    expect(normaliseHexColour('#abc')).toBe('#AABBCC');
  });

  it.each(['', '#12345', '#GGGGGG', 'red'])('rejects %j', (value) => {
    expect(() => parseHexColour(value)).toThrow(DomainInputError);
  });
});
