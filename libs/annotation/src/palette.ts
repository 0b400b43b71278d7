/**
 * BenchProof's own annotation palette. Each ink has a contrasting outline drawn
 * under the stroke, so a mark reads on black grime (the ink) and on white or
 * bright paint (the outline) alike. Checked against WCAG 2.2 non-text contrast
 * in the tests.
 */
export const PALETTE = {
  amber: { ink: '#FFB000', outline: '#141414' },
  cyan: { ink: '#00E0FF', outline: '#141414' },
  magenta: { ink: '#FF3FA4', outline: '#141414' },
  lime: { ink: '#B4FF3C', outline: '#141414' },
  white: { ink: '#FFFFFF', outline: '#141414' },
  ink: { ink: '#141414', outline: '#FFFFFF' },
} as const;
export type PaletteColour = keyof typeof PALETTE;
export const PALETTE_COLOURS = Object.keys(PALETTE) as PaletteColour[];
export const DEFAULT_COLOUR: PaletteColour = 'amber';

/**
 * Stroke widths per 1000 px of the image's long edge, so a mark has the same
 * visual weight on a thumbnail, the screen derivative and the print render.
 */
export const STROKE_WIDTHS = { thin: 3, medium: 5, bold: 8 } as const;
export type StrokeWidth = keyof typeof STROKE_WIDTHS;
export const STROKE_WIDTH_NAMES = Object.keys(STROKE_WIDTHS) as StrokeWidth[];
export const DEFAULT_WIDTH: StrokeWidth = 'medium';

/** Extra outline on each side of a stroke, per 1000 px of long edge. */
const OUTLINE_PER_1000 = 1.5;

/** Stroke width in pixels for an image of the given size. */
export function strokePx(width: StrokeWidth, image: { width: number; height: number }): number {
  return (STROKE_WIDTHS[width] * Math.max(image.width, image.height)) / 1000;
}

/** Outline stroke width in pixels (ink width plus a margin on each side). */
export function outlinePx(width: StrokeWidth, image: { width: number; height: number }): number {
  return strokePx(width, image) + (2 * OUTLINE_PER_1000 * Math.max(image.width, image.height)) / 1000;
}

/** Label font size in pixels: 2.8 % of the long edge, readable on a phone and in print. */
export function fontPx(image: { width: number; height: number }): number {
  return Math.round(0.028 * Math.max(image.width, image.height));
}
