import { Inject, Injectable, Logger } from '@nestjs/common';
import { retryDelayMs } from '@benchproof/domain';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { isPermanentSmtpError, MAIL_TRANSPORT, type MailTransport, type OutgoingAttachment } from '../infra/mail';
import { STORAGE, type Storage } from '../infra/storage';
import type { TaskContext } from '../infra/tasks';
import { type OutboxRow, MailRepository } from './mail.repository';
import type { IssuedPdf, ReportFiles } from './report-files';

/** Thrown when retrying cannot help (relay refused for good, report changed): the message fails at once. */
class PermanentFailure extends Error {}

/**
 * One delivery attempt of one outbox row (the 'mail.send' task). Exactly-once as far as SMTP
 * allows: the row is claimed by one conditional UPDATE before any byte goes out, marked sent
 * right after the relay's 250, and a re-run finds it sent and does nothing. The only gap is a
 * crash between the 250 and that one synchronous write; the row then stays 'sending', is taken
 * again after the lease and goes out with the same Message-ID, which receivers use to collapse
 * the duplicate.
 */
@Injectable()
export class MailDelivery {
  private readonly logger = new Logger('Mail');
  private reportFiles: ReportFiles | null = null;

  constructor(
    private readonly repo: MailRepository,
    @Inject(MAIL_TRANSPORT) private readonly transport: MailTransport,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  useReportFiles(files: ReportFiles): void {
    this.reportFiles = files;
  }

  /** The issued report, or null when there is none (or no reports feature is bound yet). */
  issuedPdf(shopId: number, reportId: number): Promise<IssuedPdf | null> {
    return this.reportFiles ? this.reportFiles.getIssuedPdf(shopId, reportId) : Promise.resolve(null);
  }

  /**
   * Returns normally only when this round is settled (sent, failed for good, or gone); throws
   * otherwise, so the runner records the task as failed and the relay's next enqueue is taken.
   */
  async deliver(task: Pick<TaskContext, 'key' | 'shopId'>): Promise<void> {
    const id = Number(task.key.split('.')[0]);
    const shopId = task.shopId ?? 0;
    const now = this.clock.now();
    // The lease (MAIL_SEND_LEASE_MS) is far longer than the transport's timeouts, so a live attempt is never taken over.
    const row = this.repo.claim(shopId, id, now, new Date(now.getTime() - this.cfg.MAIL_SEND_LEASE_MS));
    if (!row) {
      const current = this.repo.find(shopId, id);
      if (!current || current.status === 'sent' || current.status === 'failed') return;
      throw new Error(`Message ${id} is ${current.status} elsewhere; trying later`);
    }
    try {
      const attachments = await this.attachments(row);
      const receipt = await this.transport.send({
        from: this.cfg.MAIL_FROM,
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody,
        messageId: row.messageId,
        attachments,
      });
      this.repo.markSent(shopId, id, this.clock.now(), receipt.response);
    } catch (err) {
      this.recordFailure(row, err);
      throw err;
    }
  }

  private recordFailure(row: OutboxRow, err: unknown): void {
    const message = err instanceof Error ? err.message : String(err);
    const final = err instanceof PermanentFailure || isPermanentSmtpError(err) || row.attempts >= this.cfg.MAIL_MAX_ATTEMPTS;
    const next = final ? null : new Date(this.clock.now().getTime() + retryDelayMs(row.attempts, this.cfg.MAIL_RETRY_BASE_MS));
    this.repo.markAttemptFailed(row.shopId, row.id, message, next);
    this.logger.warn(`Message ${row.id} attempt ${row.attempts} failed${final ? ' for good' : ''}: ${message}`);
  }

  /** Opens each attachment at send time, from storage or the issued report; nothing is copied into the outbox. */
  private async attachments(row: OutboxRow): Promise<OutgoingAttachment[]> {
    const out: OutgoingAttachment[] = [];
    for (const ref of row.attachments) {
      if (ref.source.kind === 'storage') {
        if (!(await this.storage.stat(ref.source.key))) throw new PermanentFailure(`Attachment ${ref.filename} is no longer stored`);
        out.push({ filename: ref.filename, contentType: ref.contentType, content: this.storage.createReadStream(ref.source.key) });
        continue;
      }
      if (!this.reportFiles) throw new Error('Reports are not available to mail yet');
      const pdf = await this.reportFiles.getIssuedPdf(row.shopId, ref.source.reportId);
      if (!pdf) throw new PermanentFailure(`Report ${ref.source.reportId} no longer exists`);
      if (ref.sha256 && pdf.sha256 !== ref.sha256) throw new PermanentFailure(`Report ${ref.source.reportId} is not the version that was queued`);
      out.push({ filename: ref.filename, contentType: ref.contentType, content: pdf.open() });
    }
    return out;
  }
}
