import { chainElongationFromRuler, nominalChainLengthMm, PITCH_MM } from '@benchproof/domain';
import { chainReadingFromRuler, mmPerPixel, pixelLength, rulerLengthIn, rulerLengthMm, SCALE_PRESETS } from './calibration';
import type { AnnotationDocument } from './document';

const base = { colour: 'amber', width: 'medium' } as const;

function docWith(scalePx: number, knownMm: number, rulerPx: number, pitches?: number): AnnotationDocument {
  // A 2000 × 1000 image: horizontal lines, so pixels = Δx × 2000.
  return {
    schemaVersion: 2,
    image: { width: 2000, height: 1000 },
    shapes: [
      { ...base, id: 's', kind: 'scale', from: { x: 0, y: 0.2 }, to: { x: scalePx / 2000, y: 0.2 }, knownMm },
      { ...base, id: 'r', kind: 'ruler', from: { x: 0, y: 0.6 }, to: { x: rulerPx / 2000, y: 0.6 }, ...(pitches ? { pitches } : {}) },
    ],
  };
}

describe('calibrated ruler', () => {
  // Pythagoras: a 3-4-5 triangle gives an exact 500 px on a 1000 × 1000 image.
  it('measures pixel lengths on the upright image', () => {
    expect(pixelLength({ x: 0, y: 0 }, { x: 0.3, y: 0.4 }, { width: 1000, height: 1000 })).toBeCloseTo(500, 9);
  });

  // Worked numbers (arithmetic): 10 mm / 200 px = 0.05 mm/px; 350 px × 0.05 = 17.5 mm = 0.68898 in (÷ 25.4, NIST SP 811).
  it('a 10 mm reference of 200 px makes a 350 px ruler 17.5 mm', () => {
    const doc = docWith(200, 10, 350);
    expect(mmPerPixel(doc)).toBeCloseTo(0.05, 12);
    expect(rulerLengthMm(doc, 'r')).toBeCloseTo(17.5, 9);
    expect(rulerLengthIn(doc, 'r')).toBeCloseTo(17.5 / 25.4, 9);
  });

  it('measures along a diagonal on a non-square image', () => {
    const doc: AnnotationDocument = {
      ...docWith(200, 10, 350),
      image: { width: 2000, height: 1000 },
    };
    doc.shapes[1] = { ...base, id: 'r', kind: 'ruler', from: { x: 0.1, y: 0.1 }, to: { x: 0.22, y: 0.26 } }; // 240 × 160 px
    expect(rulerLengthMm(doc, 'r')).toBeCloseTo(Math.hypot(240, 160) * 0.05, 9);
  });

  it('gives no length while there is no scale reference, or a zero-length one', () => {
    const doc = docWith(200, 10, 350);
    expect(rulerLengthMm({ ...doc, shapes: doc.shapes.filter((s) => s.kind !== 'scale') }, 'r')).toBeNull();
    expect(rulerLengthMm(docWith(0, 10, 350), 'r')).toBeNull();
  });

  // ISO 9633 / ASME B29.1: ½ in pitch; NIST SP 811: 1 in = 25.4 mm exactly (CHECKS.md B.1).
  it('offers the chain pitch and the inch as exact references', () => {
    expect(SCALE_PRESETS.find((p) => p.id === 'chain-pitch')?.mm).toBe(12.7);
    expect(SCALE_PRESETS.find((p) => p.id === 'inch')?.mm).toBe(25.4);
  });
});

describe('chain wear from a photo', () => {
  // CHECKS.md B.1 worked numbers: 24 pitches = 304.800 mm nominal; 0.5 % = 306.324 mm; 1.0 % = 307.848 mm.
  // A steel rule's 1 in (25.4 mm) calibrated at 254 px gives 0.1 mm/px, so 3063.24 px = 306.324 mm.
  it.each([
    [3048, 0],
    [3063.24, 0.5],
    [3078.48, 1.0],
  ])('a ruler of %f px over 24 pitches reads %f % — the same as the typed ruler reading', (rulerPx, pct) => {
    const doc = docWith(254, 25.4, rulerPx, 24);
    const photo = chainReadingFromRuler(doc, 'r', 24);
    const typed = chainElongationFromRuler(24, (rulerPx * 25.4) / 254, 'mm');
    // Same function, same rounding: the verdict input is identical to the typed reading's.
    expect(photo?.elongationPct).toBe(typed.elongationPct);
    expect(photo?.method).toBe('ruler');
    expect(photo?.elongationPct).toBeCloseTo(pct, 6);
    expect(photo?.measuredMm).toBeCloseTo(nominalChainLengthMm(24) * (1 + pct / 100), 6);
    expect(PITCH_MM * 24).toBeCloseTo(304.8, 9);
  });

  it('refuses a ruler that cannot span the pitches counted, as a typed reading would', () => {
    // 24 pitches measured as 12 in + 1 pitch (317.5 mm): +4.17 % is still plausible; 26 pitches' worth is a miscount.
    const doc = docWith(254, 25.4, 26 * 127, 24);
    expect(() => chainReadingFromRuler(doc, 'r', 24)).toThrow(/pin to pin/);
  });
});
