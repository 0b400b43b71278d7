import { Inject, Injectable } from '@nestjs/common';
import type { OutboxMessageDto, SendReportRequest } from '@benchproof/contracts';
import { formatDate, type JobStatus } from '@benchproof/domain';
import { randomBytes } from 'node:crypto';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CustomersService } from '../customers';
import { CLOCK, type Clock } from '../core/clock';
import { type DbTx, UnitOfWork } from '../core/db';
import { TASK_RUNNER, type TaskRunner } from '../infra/tasks';
import { JobAccess, JobsService } from '../jobs';
import { ShopsService } from '../shops';
import type { OutboxAttachmentRef } from '../db/schema';
import { MAIL_SEND } from './mail-delivery';
import { type NewOutboxRow, type OutboxRow, MailRepository } from './mail.repository';
import { sealSecrets, withPlaceholders } from './outbox-secrets';
import { estimateDecisionMail } from './templates/estimate-decision';
import { type RenderedMail, type ShopBrand, withoutSecrets } from './templates/layout';
import { paymentReceiptMail, type ReceiptLine } from './templates/payment-receipt';
import { type ReportMailStage, reportReadyMail } from './templates/report-ready';

/** A message to queue. Attachments are references, opened at send time. */
export interface QueuedMail {
  shopId: number;
  jobId: number | null;
  /** e.g. 'report_ready', 'estimate_decision' */
  kind: string;
  reportId?: number | null;
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments: OutboxAttachmentRef[];
  createdBy?: number | null;
  /** Strings in the body (an owner link) that the row must not keep once the message is sent. */
  secrets?: string[];
}

type Actor = Pick<AuthUser, 'id' | 'shopId'>;

/** An issued report PDF as the reports feature hands it to mail: attached by storage key and SHA-256. */
export interface ReportPdf {
  reportId: number;
  jobId: number;
  version: number;
  filename: string;
  storageKey: string;
  /** Hex SHA-256 of the PDF bytes, as issued. */
  sha256: string;
  size: number;
  /** The owner's private page (a link made for this message), or null when the job can have none. */
  link: { url: string; expiresAt: Date } | null;
  /** Recommendations still waiting for the owner's decision. */
  openItems: number;
}

/** "Finished" only of finished work; open items on an open job ask for the owner's decision; a cancelled job gets the plain record. */
export function reportStage(status: JobStatus, openItems: number): ReportMailStage {
  if (status === 'cancelled') return { kind: 'record' };
  if (status === 'collected' || (status === 'ready' && openItems === 0)) return { kind: 'finished' };
  return openItems > 0 ? { kind: 'decision', openItems } : { kind: 'in_progress' };
}

/** A fresh key for a message's delivery task: a resend is a new task. */
const newTaskKey = (): string => randomBytes(8).toString('hex');

/** The outbox: every e-mail is a row written with its cause, delivered by the 'mail.send' task. */
@Injectable()
export class MailService {
  constructor(
    private readonly repo: MailRepository,
    private readonly uow: UnitOfWork,
    private readonly jobs: JobsService,
    private readonly access: JobAccess,
    private readonly customers: CustomersService,
    private readonly bikes: BikesService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** Writes the outbox row and its task; pass the cause's transaction so both commit or neither. */
  queue(mail: QueuedMail, tx?: DbTx): OutboxMessageDto {
    const write = (t: DbTx) => {
      const row = this.repo.insert(
        {
          shopId: mail.shopId,
          jobId: mail.jobId,
          kind: mail.kind,
          reportId: mail.reportId ?? null,
          toAddress: mail.to,
          subject: mail.subject,
          ...this.bodies(mail),
          attachments: mail.attachments,
          status: 'queued',
          taskKey: newTaskKey(),
          messageId: this.newMessageId(mail.shopId),
          createdBy: mail.createdBy ?? null,
          createdAt: this.clock.now(),
        },
        t,
      );
      this.enqueue(row, t);
      if (row.kind === 'report_ready' && row.jobId !== null) this.jobs.recordReportSent({ shopId: row.shopId }, row.jobId, true);
      return row;
    };
    return this.toDto(tx ? write(tx) : this.uow.run(write));
  }

  private enqueue(row: OutboxRow, tx: DbTx): void {
    this.tasks.enqueue({ kind: MAIL_SEND, key: row.taskKey, shopId: row.shopId, payload: { messageId: row.id } }, tx);
  }

  /**
   * The bodies as stored. With secrets (an owner link): a placeholder where each stood, the secrets sealed
   * beside them (opened at send time), and the bodies that replace these once sent (MailRepository.markSent).
   */
  private bodies(mail: QueuedMail): Pick<NewOutboxRow, 'textBody' | 'htmlBody' | 'textAfterSend' | 'htmlAfterSend' | 'sealedSecrets'> {
    const secrets = (mail.secrets ?? []).filter(Boolean);
    if (!secrets.length) return { textBody: mail.text, htmlBody: mail.html, textAfterSend: null, htmlAfterSend: null, sealedSecrets: null };
    return {
      textBody: withPlaceholders(mail.text, secrets),
      htmlBody: withPlaceholders(mail.html, secrets),
      textAfterSend: withoutSecrets(mail.text, secrets),
      htmlAfterSend: withoutSecrets(mail.html, secrets),
      sealedSecrets: sealSecrets(this.cfg.jwtSecret, secrets),
    };
  }

  /** Every message of a job, newest first, with where it is on its way. */
  listForJob(actor: Actor, jobId: number): OutboxMessageDto[] {
    this.access.read(actor, jobId);
    return this.repo.listByJob(actor.shopId, jobId).map((r) => this.toDto(r));
  }

  /** Desk sends a finally failed message again: a new task with fresh attempts, same Message-ID. */
  resend(actor: Actor, jobId: number, id: number): OutboxMessageDto {
    this.access.read(actor, jobId);
    const row = this.repo.find(actor.shopId, id);
    if (!row || row.jobId !== jobId) throw notFound('Message');
    const again = this.uow.run((tx) => {
      const updated = this.repo.requeue(actor.shopId, id, newTaskKey(), tx);
      if (!updated) throw new DomainError('MESSAGE_NOT_RESENDABLE', undefined, { status: row.status });
      this.enqueue(updated, tx);
      if (updated.kind === 'report_ready') this.jobs.recordReportSent(actor, jobId, true);
      this.audit.record(actor, { action: 'mail.resent', entityType: 'outbox_message', entityId: id, details: { jobId } });
      return updated;
    });
    return this.toDto(again);
  }

  /**
   * Queues the report e-mail to the owner: ONE message with the PDF attached within the budget (by its
   * storage key and SHA-256) and the owner's private link (sealed in the row until sent), worded by where
   * the job stands. The reports feature calls this with its issued PDF and a fresh owner link.
   */
  sendReport(actor: Actor, jobId: number, pdf: ReportPdf, input: SendReportRequest): OutboxMessageDto {
    const job = this.access.read(actor, jobId);
    if (pdf.jobId !== jobId) throw notFound('Report');
    const { reportId } = pdf;
    const to = this.recipient(actor, job.customerId, input.to);
    const attached = pdf.size <= this.cfg.MAIL_ATTACHMENT_BUDGET;
    const ctx = this.context(actor, job);
    const locale = this.shops.settings(actor.shopId).dateLocale;
    const rendered = reportReadyMail({
      ...ctx,
      version: pdf.version,
      stage: reportStage(job.status, pdf.openItems),
      attached,
      sizeBytes: pdf.size,
      budgetBytes: this.cfg.MAIL_ATTACHMENT_BUDGET,
      link: pdf.link?.url ?? null,
      linkUntil: pdf.link ? formatDate(pdf.link.expiresAt, locale, { timeZone: 'UTC' }) : null,
    });
    const attachments: OutboxAttachmentRef[] = attached
      ? [{ filename: pdf.filename, contentType: 'application/pdf', size: pdf.size, sha256: pdf.sha256, source: { kind: 'storage', key: pdf.storageKey } }]
      : [];
    const secrets = pdf.link ? [pdf.link.url] : [];
    return this.uow.run((tx) => {
      const dto = this.queue({ shopId: actor.shopId, jobId, kind: 'report_ready', reportId, to, ...rendered, attachments, createdBy: actor.id, secrets }, tx);
      const details = { jobId, to, attached, withLink: !!pdf.link, messageId: dto.id };
      this.audit.record(actor, { action: 'report.sent', entityType: 'report', entityId: reportId, details });
      return dto;
    });
  }

  /** Queues "your estimate needs your decision" with the owner link; the owner feature calls this, in its transaction if it has one. */
  queueEstimateDecision(actor: Actor, jobId: number, ownerLink: string, tx?: DbTx): OutboxMessageDto {
    const job = this.access.read(actor, jobId);
    const to = this.recipient(actor, job.customerId, undefined);
    const rendered: RenderedMail = estimateDecisionMail({ ...this.context(actor, job), link: ownerLink });
    return this.queue(
      { shopId: actor.shopId, jobId, kind: 'estimate_decision', to, ...rendered, attachments: [], createdBy: actor.id, secrets: [ownerLink] },
      tx,
    );
  }

  /** Queues the "paid in full" receipt in the payment's transaction; null when the owner has no e-mail address. */
  queueReceipt(
    scope: { shopId: number },
    jobId: number,
    money: { netMinor: number; taxMinor: number; grossMinor: number; payments: ReceiptLine[]; paidAt: Date },
    tx: DbTx,
  ): OutboxMessageDto | null {
    const job = this.access.read(scope, jobId);
    const to = this.customers.get(scope, job.customerId).email;
    if (!to) return null;
    const ctx = this.context(scope, job);
    const settings = this.shops.settings(scope.shopId);
    const paidOn = formatDate(money.paidAt, settings.dateLocale, { timeZone: 'UTC' });
    const rendered = paymentReceiptMail({ ...ctx, ...money, shop: { ...ctx.shop, taxNumber: settings.taxNumber, currency: settings.currency }, paidOn });
    return this.queue({ shopId: scope.shopId, jobId, kind: 'payment_receipt', to, ...rendered, attachments: [] }, tx);
  }

  private recipient(actor: Actor, customerId: number, override: string | undefined): string {
    const to = override ?? this.customers.get(actor, customerId).email;
    if (!to) throw new DomainError('NO_OWNER_EMAIL', undefined, { field: 'to' });
    return to;
  }

  private context(
    actor: Pick<Actor, 'shopId'>,
    job: { number: string; customerId: number; bikeId: number },
  ): { shop: ShopBrand; ownerName: string; jobNumber: string; dated: string; bikeLabel: string } {
    const shop = this.shops.settings(actor.shopId);
    const bike = this.bikes.get(actor, job.bikeId);
    const ownerName = this.customers.get(actor, job.customerId).name;
    // Days in UTC, as the report prints them; the shop's locale decides how the day is written.
    const dated = formatDate(this.clock.now(), shop.dateLocale, { timeZone: 'UTC' });
    return { shop, ownerName, jobNumber: job.number, dated, bikeLabel: [bike.maker, bike.model].filter(Boolean).join(' ') || 'bike' };
  }

  /** Fixed when queued: a retry after a crash mid-send carries the same id, so receivers can drop the copy. */
  private newMessageId(shopId: number): string {
    const domain = /@([^>\s]+)>?\s*$/.exec(this.cfg.MAIL_FROM)?.[1] ?? 'benchproof.localhost';
    return `<bp-${shopId}-${randomBytes(12).toString('hex')}@${domain}>`;
  }

  private toDto(r: OutboxRow): OutboxMessageDto {
    return {
      id: r.id,
      jobId: r.jobId,
      kind: r.kind,
      reportId: r.reportId,
      to: r.toAddress,
      subject: r.subject,
      status: r.status,
      attempts: r.attempts,
      maxAttempts: this.cfg.MAIL_MAX_ATTEMPTS,
      lastError: r.lastError,
      nextTryAt: r.status === 'queued' ? (this.tasks.status(MAIL_SEND, r.taskKey)?.nextRunAt ?? null) : null,
      sentAt: r.sentAt?.toISOString() ?? null,
      createdAt: r.createdAt.toISOString(),
      messageId: r.messageId,
      attachments: r.attachments.map((a) => ({ filename: a.filename, size: a.size })),
      canResend: r.status === 'failed',
    };
  }
}
