import { DomainError } from '../core/http';

/** True when the owner was sent a report for the job (the mail feature answers this). */
export type ReportSentCheck = (shopId: number, jobId: number) => boolean;

/** The hand-over rule: with no report sent, desk must confirm, and the job records it. */
export class ReportSentChecks {
  private readonly checks: ReportSentCheck[] = [];

  add(check: ReportSentCheck): void {
    this.checks.push(check);
  }

  /** Whether a report went out; throws REPORT_NOT_SENT when none did and desk has not confirmed. */
  require(shopId: number, jobId: number, confirmed: boolean | undefined): boolean {
    const sent = this.checks.some((check) => check(shopId, jobId));
    if (!sent && !confirmed) throw new DomainError('REPORT_NOT_SENT');
    return sent;
  }
}
