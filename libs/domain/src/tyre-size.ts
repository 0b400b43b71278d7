import { DomainInputError } from './errors';

/** ISO 5775-1 (ETRTO) designation "width-BSD" in mm, e.g. "28-622". */
export const TYRE_SIZE_PATTERN = /^(\d{2,3})-(\d{3})$/;

/**
 * Familiar names of common bead seat diameters (ISO 5775-1, from memory;
 * CHECKS.md B.10). Used for labels only.
 */
export const COMMON_BSD_NAMES: Readonly<Record<number, string>> = {
  622: '700C / 29″',
  584: '650B / 27.5″',
  571: '650C',
  559: '26″ MTB',
  406: '20″',
  305: '16″',
};

const WIDTH_MM = { min: 16, max: 130 };
const BSD_MM = { min: 100, max: 700 };

export interface TyreSize {
  readonly widthMm: number;
  readonly bsdMm: number;
  /** "28-622 (700C / 29″)", or the bare designation for an uncommon BSD. */
  readonly label: string;
}

/** Parses "28-622"; throws DomainInputError INVALID_FORMAT for anything else or implausible sizes. */
export function parseTyreSize(text: string): TyreSize {
  const designation = text.trim();
  const match = TYRE_SIZE_PATTERN.exec(designation);
  const widthMm = match ? Number(match[1]) : 0;
  const bsdMm = match ? Number(match[2]) : 0;
  const plausible = widthMm >= WIDTH_MM.min && widthMm <= WIDTH_MM.max && bsdMm >= BSD_MM.min && bsdMm <= BSD_MM.max;
  if (!match || !plausible) {
    throw new DomainInputError('INVALID_FORMAT', `Not a tyre size: "${text}". Use the ISO 5775 width-BSD form printed on the tyre, e.g. 28-622.`, {
      value: text,
    });
  }
  const name = COMMON_BSD_NAMES[bsdMm];
  return { widthMm, bsdMm, label: name ? `${designation} (${name})` : designation };
}

/** True when `text` is a plausible ISO 5775 designation. */
export function isTyreSize(text: string): boolean {
  try {
    parseTyreSize(text);
    return true;
  } catch {
    return false;
  }
}
