import { chainElongationFromRuler, MM_PER_INCH, type ChainReading } from '@benchproof/domain';
import type { AnnotationDocument, Point } from './document';

/** Length in image pixels of a line given in normalised coordinates. */
export function pixelLength(from: Point, to: Point, image: { width: number; height: number }): number {
  return Math.hypot((to.x - from.x) * image.width, (to.y - from.y) * image.height);
}

/** Standard references a mechanic can pick instead of typing a length. */
export const SCALE_PRESETS = [
  /** One bicycle chain pitch, 1/2 in (ISO 9633 / ASME B29.1; NIST SP 811: 1 in = 25.4 mm exactly). */
  { id: 'chain-pitch', label: 'One chain pitch (12.7 mm)', mm: 0.5 * MM_PER_INCH },
  /** One inch on a steel rule (NIST SP 811). */
  { id: 'inch', label: 'One inch on a rule (25.4 mm)', mm: MM_PER_INCH },
  { id: 'cm', label: '1 cm on a rule (10 mm)', mm: 10 },
] as const;

/**
 * Millimetres per pixel from the document's scale reference (a line of known length
 * drawn over something measured, e.g. a ruler in the shot), or null when there is none.
 * With several, the last drawn wins (the mechanic's latest correction).
 */
export function mmPerPixel(doc: AnnotationDocument): number | null {
  const scale = doc.shapes.findLast((s) => s.kind === 'scale');
  if (!scale || scale.kind !== 'scale') return null;
  const px = pixelLength(scale.from, scale.to, doc.image);
  if (px === 0 || !(scale.knownMm > 0)) return null;
  return scale.knownMm / px;
}

/** A ruler's measured length in mm, or null while the photo has no scale. */
export function rulerLengthMm(doc: AnnotationDocument, rulerId: string): number | null {
  const ruler = doc.shapes.find((s) => s.id === rulerId);
  const scale = mmPerPixel(doc);
  if (!ruler || ruler.kind !== 'ruler' || scale === null) return null;
  return pixelLength(ruler.from, ruler.to, doc.image) * scale;
}

/** A ruler's length in inches (1 in = 25.4 mm exactly, NIST SP 811), or null without a scale. */
export function rulerLengthIn(doc: AnnotationDocument, rulerId: string): number | null {
  const mm = rulerLengthMm(doc, rulerId);
  return mm === null ? null : mm / MM_PER_INCH;
}

/**
 * Chain elongation from a ruler laid over `pitches` pitches on a calibrated photo,
 * through the same domain function as a typed ruler reading (so the same MISREAD
 * refusals and rounding apply). Null while the photo has no scale.
 */
export function chainReadingFromRuler(doc: AnnotationDocument, rulerId: string, pitches: number): ChainReading | null {
  const mm = rulerLengthMm(doc, rulerId);
  return mm === null ? null : chainElongationFromRuler(pitches, mm, 'mm');
}

/** "17.5 mm" for screens and renders: 0.1 mm, which is all a photo can give. */
export function formatMm(mm: number): string {
  return `${mm.toFixed(1)} mm`;
}
