import { Injectable, type OnModuleInit } from '@nestjs/common';
import { DomainError } from '../core/http';
import { type IssuedPdf, MailService } from '../mail';
import { ReportsService } from './reports.service';

/**
 * Hands the issued PDFs to the mail feature at start-up. Mail sits below reports
 * in the dependency order (it never imports reports), so the binding lives here.
 */
@Injectable()
export class ReportMailBinding implements OnModuleInit {
  constructor(
    private readonly mail: MailService,
    private readonly reports: ReportsService,
  ) {}

  onModuleInit(): void {
    this.mail.useReportFiles({ getIssuedPdf: (shopId, reportId) => Promise.resolve(this.issued(shopId, reportId)) });
  }

  private issued(shopId: number, reportId: number): IssuedPdf | null {
    try {
      const f = this.reports.issuedPdf(shopId, reportId);
      // No link: the owner page's address holds a token that is stored only hashed, and the
      // staff download needs a sign-in. Over the attachment budget the mail says to ask the shop.
      return {
        reportId: f.reportId,
        jobId: f.jobId,
        version: f.version,
        filename: f.filename,
        sha256: f.sha256,
        size: f.byteSize,
        link: null,
        open: () => f.stream(),
      };
    } catch (err) {
      if (err instanceof DomainError && err.code === 'NOT_FOUND') return null;
      throw err;
    }
  }
}
