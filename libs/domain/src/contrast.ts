import { DomainInputError } from './errors';

/**
 * WCAG 2.2 contrast (W3C Recommendation 2023; definitions "relative
 * luminance" and "contrast ratio", unchanged since 2.0; sRGB transfer from
 * IEC 61966-2-1:1999). Ratios are never rounded: 4.48 fails 4.5.
 */
export const WCAG_THRESHOLDS = {
  /** SC 1.4.3 AA, normal text. */
  aaText: 4.5,
  /** SC 1.4.3 AA, large text (≥ 18 pt, or ≥ 14 pt bold). */
  aaLargeText: 3,
  /** SC 1.4.6 AAA, normal text. */
  aaaText: 7,
  /** SC 1.4.6 AAA, large text. */
  aaaLargeText: 4.5,
  /** SC 1.4.11 AA, UI components and graphical objects (annotation marks, condition chips). */
  nonText: 3,
} as const;
export type WcagThreshold = keyof typeof WCAG_THRESHOLDS;

const HEX = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i;

/** Parses "#RRGGBB" or "#RGB" (hash optional) into 8-bit channels. */
export function parseHexColour(hex: string): [number, number, number] {
  const match = HEX.exec(hex.trim());
  if (!match) {
    throw new DomainInputError('INVALID_FORMAT', `Not a hex colour: "${hex}" (use #RRGGBB).`, { value: hex });
  }
  const digits = match[1].length === 3 ? [...match[1]].map((c) => c + c).join('') : match[1];
  return [0, 2, 4].map((i) => parseInt(digits.slice(i, i + 2), 16)) as [number, number, number];
}

/** Normalises to upper-case "#RRGGBB". */
export function normaliseHexColour(hex: string): string {
  return `#${parseHexColour(hex)
    .map((c) => c.toString(16).padStart(2, '0'))
    .join('')
    .toUpperCase()}`;
}

/** sRGB channel (0–255) to linear light; threshold 0.04045 (WCAG 2.2 / IEC 61966-2-1). */
function linear(channel8: number): number {
  const c = channel8 / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

/** Relative luminance L = 0.2126 R + 0.7152 G + 0.0722 B of linear channels (WCAG 2.2). */
export function relativeLuminance(hex: string): number {
  const [r, g, b] = parseHexColour(hex);
  return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}

/** (L_lighter + 0.05) / (L_darker + 0.05), 1 to 21, symmetric in its arguments (WCAG 2.2). */
export function contrastRatio(hexA: string, hexB: string): number {
  const a = relativeLuminance(hexA);
  const b = relativeLuminance(hexB);
  return (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
}

/** True when the pair reaches the threshold; no rounding up. */
export function meetsContrast(hexA: string, hexB: string, threshold: WcagThreshold = 'aaText'): boolean {
  return contrastRatio(hexA, hexB) >= WCAG_THRESHOLDS[threshold];
}

/** Black or white text, whichever contrasts more with the background (black on a tie). */
export function readableTextOn(backgroundHex: string): '#000000' | '#FFFFFF' {
  return contrastRatio(backgroundHex, '#000000') >= contrastRatio(backgroundHex, '#FFFFFF') ? '#000000' : '#FFFFFF';
}
