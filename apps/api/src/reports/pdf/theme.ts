import { StyleSheet } from '@react-pdf/renderer';
import type { Condition } from '@benchproof/domain';
import { PDF_FONT } from '../../infra/pdf';

/** Page sizes in PDF points (1/72 in, ISO 32000-1 8.3.2): A4 210 × 297 mm (ISO 216), Letter 8.5 × 11 in. */
export const PAGE_POINTS = { A4: { width: 595.28, height: 841.89 }, Letter: { width: 612, height: 792 } } as const;
export const MARGIN = 40;
export const GUTTER = 12;

/** Body text and rules: #222222 on white is 15.9:1, #555555 is 7.5:1 (WCAG 2.2, both ≥ 4.5). */
export const INK = '#222222';
export const MUTED = '#555555';
export const RULE = '#BBBBBB';

/**
 * Condition marks: colour AND shape, so a greyscale print still tells them apart
 * (our own scale and shapes). Each colour is ≥ 3:1 on white (SC 1.4.11 non-text).
 */
export const CONDITION_MARK: Record<Condition, { colour: string; shape: 'circle' | 'diamond' | 'triangle' | 'cross' }> = {
  sound: { colour: '#2E7D32', shape: 'circle' },
  wearing: { colour: '#8A6D00', shape: 'diamond' },
  worn: { colour: '#C04A00', shape: 'triangle' },
  unsafe: { colour: '#B3261E', shape: 'cross' },
};

export const styles = StyleSheet.create({
  page: { fontFamily: PDF_FONT, fontSize: 10, color: INK, paddingTop: 58, paddingBottom: 56, paddingHorizontal: MARGIN },
  // On the content, not the page: a page-level lineHeight hides react-pdf's render-prop page numbers.
  body: { lineHeight: 1.35 },
  coverPage: { fontFamily: PDF_FONT, fontSize: 11, color: INK, padding: 0 },
  h1: { fontSize: 20, fontWeight: 700, marginBottom: 10 },
  sectionGap: { marginTop: 18 },
  h2: { fontSize: 14, fontWeight: 700, marginTop: 14, marginBottom: 6 },
  h3: { fontSize: 11, fontWeight: 600, marginBottom: 3 },
  muted: { color: MUTED },
  small: { fontSize: 8.5, color: MUTED },
  row: { flexDirection: 'row' },
  tableHead: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: INK, paddingBottom: 3, marginBottom: 2, fontWeight: 600 },
  tableRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 3 },
  box: { borderWidth: 1, borderColor: RULE, borderRadius: 3, padding: 8, marginBottom: 8 },
  danger: { borderWidth: 2, borderColor: CONDITION_MARK.unsafe.colour, borderRadius: 3, padding: 8, marginBottom: 8 },
});
