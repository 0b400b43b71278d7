import { Inject, Injectable, Logger } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { isPermanentSmtpError, MAIL_TRANSPORT, type MailTransport, type OutgoingAttachment } from '../infra/mail';
import { STORAGE, type Storage } from '../infra/storage';
import { PermanentTaskError, type TaskContext, TaskHandler } from '../infra/tasks';
import { JobsService } from '../jobs';
import type { OutboxAttachmentRef } from '../db/schema';
import { type OutboxRow, MailRepository } from './mail.repository';
import { fillSecrets, openSecrets } from './outbox-secrets';

export const MAIL_SEND = 'mail.send' as const;

/**
 * Delivers one outbox row: the 'mail.send' task. The task runner is its only scheduler (retries
 * on its backoff with MAIL_RETRY_BASE_MS, MAIL_MAX_ATTEMPTS, its lease after a crash, a long
 * retry for a relay that stays away); the row is the record desk sees. Exactly-once as far as
 * SMTP allows: the row is claimed before any byte goes out, marked sent right after the relay's
 * 250, and a re-run finds it sent and does nothing. The only gap is a crash between the 250 and
 * that one write; the task then runs again after its lease with the same Message-ID, which
 * receivers use to collapse the duplicate.
 */
@Injectable()
export class MailDelivery {
  private readonly logger = new Logger('Mail');

  constructor(
    private readonly repo: MailRepository,
    private readonly jobs: JobsService,
    @Inject(MAIL_TRANSPORT) private readonly transport: MailTransport,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  @TaskHandler(MAIL_SEND, { concurrency: 2, maxAttempts: (cfg) => cfg.MAIL_MAX_ATTEMPTS, backoffBaseMs: (cfg) => cfg.MAIL_RETRY_BASE_MS })
  async deliver(task: TaskContext<typeof MAIL_SEND>): Promise<void> {
    const shopId = task.shopId ?? 0;
    const row = this.repo.claim(shopId, task.payload.messageId, task.key);
    if (!row) return; // sent already, or desk resent it under a newer task
    try {
      const secrets = this.secrets(row);
      const receipt = await this.transport.send({
        from: this.cfg.MAIL_FROM,
        to: row.toAddress,
        subject: row.subject,
        text: fillSecrets(row.textBody, secrets, false),
        html: fillSecrets(row.htmlBody, secrets, true),
        messageId: row.messageId,
        attachments: await this.attachments(row),
      });
      this.repo.markSent(shopId, row.id, task.attempt, this.clock.now(), receipt.response);
    } catch (err) {
      throw this.recordFailure(row, err, task);
    }
  }

  /** The message's sealed secrets (an owner link), opened only for this send; a key that changed since it was queued cannot. */
  private secrets(row: OutboxRow): string[] {
    if (!row.sealedSecrets) return [];
    try {
      return openSecrets(this.cfg.jwtSecret, row.sealedSecrets);
    } catch {
      throw new PermanentTaskError('The link in this message was sealed with another server secret (JWT_SECRET changed); send a new link');
    }
  }

  /** Records the attempt on the row; returns what the runner should see (permanent: no more tries). */
  private recordFailure(row: OutboxRow, err: unknown, task: Pick<TaskContext, 'attempt' | 'final'>): unknown {
    const message = err instanceof Error ? err.message : String(err);
    const permanent = err instanceof PermanentTaskError || isPermanentSmtpError(err);
    const final = permanent || task.final;
    this.repo.markAttemptFailed(row.shopId, row.id, task.attempt, message, final);
    if (final && row.kind === 'report_ready' && row.jobId !== null)
      this.jobs.recordReportSent({ shopId: row.shopId }, row.jobId, this.repo.hasReportMessage(row.shopId, row.jobId));
    this.logger.warn(`Message ${row.id} attempt ${task.attempt} failed${final ? ' (desk may resend it)' : ''}: ${message}`);
    return permanent && !(err instanceof PermanentTaskError) ? new PermanentTaskError(message) : err;
  }

  /** Opens each attachment from storage at send time; bytes other than those queued fail the message rather than mail the wrong file. */
  private async attachments(row: OutboxRow): Promise<OutgoingAttachment[]> {
    const out: OutgoingAttachment[] = [];
    for (const ref of row.attachments) {
      if (ref.source.kind !== 'storage') throw new PermanentTaskError(`Attachment ${ref.filename} has no storage key`);
      await this.check(ref, ref.source.key);
      out.push({ filename: ref.filename, contentType: ref.contentType, content: this.storage.createReadStream(ref.source.key) });
    }
    return out;
  }

  private async check(ref: OutboxAttachmentRef, key: string): Promise<void> {
    const stat = await this.storage.stat(key);
    if (!stat) throw new PermanentTaskError(`Attachment ${ref.filename} is no longer stored`);
    if (ref.size !== null && stat.bytes !== ref.size) throw new PermanentTaskError(`Attachment ${ref.filename} is not the file that was queued`);
    if (ref.sha256 === null) return;
    const hash = createHash('sha256');
    for await (const chunk of this.storage.createReadStream(key)) hash.update(chunk as Buffer);
    if (hash.digest('hex') !== ref.sha256) throw new PermanentTaskError(`Attachment ${ref.filename} is not the file that was queued`);
  }
}
