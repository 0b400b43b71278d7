import { WCAG_THRESHOLDS, contrastRatio, normaliseHexColour, parseHexColour, readableTextOn } from './contrast';

/** Paper is white; brand colours appear as filled surfaces (cover, bands) and as text on paper (headings). */
export const PAPER = '#FFFFFF';

/** A brand-coloured surface and the text colour the report prints on it. */
export interface BrandSurface {
  background: string;
  text: '#000000' | '#FFFFFF';
  /** WCAG 2.2 contrast of text on background. */
  ratio: number;
}

/** A brand colour used as body/heading text on white paper. */
export interface BrandInk {
  /** The colour the manager chose. */
  chosen: string;
  /** The colour the report prints: the chosen one, or a darker shade of it when that fails 4.5:1. */
  used: string;
  chosenRatio: number;
  usedRatio: number;
  adjusted: boolean;
}

export interface ReportPalette {
  primary: BrandSurface;
  accent: BrandSurface;
  primaryInk: BrandInk;
  accentInk: BrandInk;
}

/** Mixes a colour toward black by `t` (0..1) in 8-bit sRGB. */
function darken(hex: string, t: number): string {
  const channels = parseHexColour(hex).map((c) => Math.round(c * (1 - t)));
  return normaliseHexColour(channels.map((c) => c.toString(16).padStart(2, '0')).join(''));
}

/** The text colour (black or white) on a brand-coloured surface; ≥ 4.5:1 for every sRGB colour. */
export function brandSurface(background: string): BrandSurface {
  const bg = normaliseHexColour(background);
  const text = readableTextOn(bg);
  return { background: bg, text, ratio: contrastRatio(bg, text) };
}

/**
 * The colour to print a brand colour as text on paper. Kept when it reaches
 * SC 1.4.3 AA for body text (4.5:1, not rounded up); otherwise darkened toward
 * black in 1 % steps until it does, so the shade stays recognisably the brand's.
 */
export function brandInk(colour: string, paper: string = PAPER): BrandInk {
  const chosen = normaliseHexColour(colour);
  const chosenRatio = contrastRatio(chosen, paper);
  let used = chosen;
  for (let step = 1; contrastRatio(used, paper) < WCAG_THRESHOLDS.aaText && step <= 100; step += 1) {
    used = darken(chosen, step / 100);
  }
  return { chosen, used, chosenRatio, usedRatio: contrastRatio(used, paper), adjusted: used !== chosen };
}

/** Every colour decision the report makes from the shop's two brand colours. */
export function reportPalette(primary: string, accent: string): ReportPalette {
  return { primary: brandSurface(primary), accent: brandSurface(accent), primaryInk: brandInk(primary), accentInk: brandInk(accent) };
}
