import type { ReactElement } from 'react';

/** The one family the report uses; registered once per process. */
export const PDF_FONT = 'Inter';

type ReactPdf = typeof import('@react-pdf/renderer');

/**
 * Inter TTF from @expo-google-fonts/inter (SIL OFL 1.1; the full glyph set, so
 * owner names with ő, ł, ş render — the web's woff subsets do not, see STACK.md).
 * react-pdf embeds a subset of it in every PDF.
 */
function registerFonts({ Font }: ReactPdf): void {
  const file = (path: string) => require.resolve(`@expo-google-fonts/inter/${path}`);
  Font.register({
    family: PDF_FONT,
    fonts: [
      { src: file('400Regular/Inter_400Regular.ttf'), fontWeight: 400 },
      { src: file('400Regular_Italic/Inter_400Regular_Italic.ttf'), fontWeight: 400, fontStyle: 'italic' },
      { src: file('600SemiBold/Inter_600SemiBold.ttf'), fontWeight: 600 },
      { src: file('700Bold/Inter_700Bold.ttf'), fontWeight: 700 },
    ],
  });
  // Words are never split with hyphens we did not write (names, part numbers).
  Font.registerHyphenationCallback((word) => [word]);
}

/**
 * Renders react-pdf documents to PDF bytes. react-pdf (with yoga, pdfkit and fontkit, about 50 MB of
 * RSS) loads and the fonts register with the first render, not at boot.
 */
export class PdfAdapter {
  private renderer?: Promise<ReactPdf>;
  private reader?: Promise<typeof import('pdf-lib')>;

  async render(document: ReactElement): Promise<Buffer> {
    const { renderToBuffer } = await this.load();
    // renderToBuffer's type wants a <Document> element; our callers always pass one.
    return renderToBuffer(document as Parameters<typeof renderToBuffer>[0]);
  }

  private load(): Promise<ReactPdf> {
    this.renderer ??= import('@react-pdf/renderer').then((pdf) => (registerFonts(pdf), pdf));
    return this.renderer;
  }

  /**
   * Pages in a PDF, read with pdf-lib (its page tree, not a text search). Loaded with the first
   * count, not at boot: about 16 MB of RSS against pdfjs-dist's 36 MB for the same count.
   */
  async pageCount(pdf: Buffer): Promise<number> {
    this.reader ??= import('pdf-lib');
    const { PDFDocument } = await this.reader;
    return (await PDFDocument.load(pdf, { updateMetadata: false })).getPageCount();
  }
}

export const PDF = Symbol('PDF');
