import type { Readable } from 'node:stream';

/** An issued (immutable) report PDF as the mail feature needs it. */
export interface IssuedPdf {
  reportId: number;
  jobId: number;
  version: number;
  filename: string;
  /** Hex SHA-256 of the PDF bytes, as issued. */
  sha256: string;
  size: number;
  /** Where the owner can open the report without an attachment (the owner page), or null. */
  link: string | null;
  /** A fresh stream of the PDF bytes each call. */
  open(): Readable;
}

/**
 * What mail needs from the reports feature. Mail does not import reports: the reports
 * feature hands itself (or an adapter) to MailService.useReportFiles() when it starts,
 * so mail stays below reports in the dependency order.
 */
export interface ReportFiles {
  /** The issued report of that shop, or null when there is none with that id. */
  getIssuedPdf(shopId: number, reportId: number): Promise<IssuedPdf | null>;
}
