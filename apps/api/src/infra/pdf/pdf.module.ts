import { Global, Module } from '@nestjs/common';
import { PDF, PdfAdapter } from './pdf.adapter';
import { PDF_PAGES, PdfPageImages } from './pdf-pages';

@Global()
@Module({
  providers: [
    { provide: PDF, useFactory: () => new PdfAdapter() },
    { provide: PDF_PAGES, useFactory: () => new PdfPageImages() },
  ],
  exports: [PDF, PDF_PAGES],
})
export class PdfModule {}
