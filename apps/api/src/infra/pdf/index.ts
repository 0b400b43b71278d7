export { PDF, PDF_FONT, PdfAdapter } from './pdf.adapter';
export { PDF_PAGES, PdfPageImages } from './pdf-pages';
export { PdfModule } from './pdf.module';
