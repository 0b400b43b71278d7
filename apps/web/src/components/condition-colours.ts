import type { Condition } from '@benchproof/domain';

/**
 * BenchProof's own condition palette: a teal, a brass, a rust and a plum.
 * Each reaches at least 3:1 against white (WCAG 2.2 SC 1.4.11, non-text
 * contrast; asserted in condition-badge.test.tsx), and each step also has
 * its own glyph so the scale reads in greyscale print.
 */
export const CONDITION_COLOURS: Readonly<Record<Condition, string>> = {
  sound: '#1F6E68',
  wearing: '#8A6A0C',
  worn: '#A4471B',
  unsafe: '#8E1B4A',
};
