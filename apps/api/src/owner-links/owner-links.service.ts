import { Inject, Injectable } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { type CreatedOwnerLinkDto, type CreateOwnerLinkRequest, CreateOwnerLinkRequestSchema, type OwnerLinkDto } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { OwnerLinkChangedEvent, OwnerPageViewedEvent, publish } from '../core/events';
import { JobAccess } from '../jobs';
import { type OwnerLinkRow, OwnerLinksRepository } from './owner-links.repository';
import { hashOwnerToken, newOwnerToken, ownerTokenSignatureOk } from './owner-token';
import { OWNER_LINK_MAILER, type OwnerActor, type OwnerLinkMailerPort, type OwnerLinkSent } from './owner-links.ports';
import { type DbTx, UnitOfWork } from '../core/db';

const DAY_MS = 24 * 3600 * 1000;
const iso = (d: Date | null): string | null => (d ? d.toISOString() : null);

/** Owner links of jobs: created and revoked by desk, resolved for every owner-route request. */
@Injectable()
export class OwnerLinksService {
  constructor(
    private readonly repo: OwnerLinksRepository,
    private readonly uow: UnitOfWork,
    private readonly access: JobAccess,
    private readonly audit: AuditService,
    private readonly emitter: EventEmitter2,
    @Inject(OWNER_LINK_MAILER) private readonly mailer: OwnerLinkMailerPort,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  private toDto(r: OwnerLinkRow): OwnerLinkDto {
    const now = this.clock.now().getTime();
    const state = r.revokedAt ? 'revoked' : r.expiresAt.getTime() <= now ? 'expired' : 'active';
    return {
      id: r.id,
      jobId: r.jobId,
      state,
      createdAt: r.createdAt.toISOString(),
      createdById: r.createdBy,
      expiresAt: r.expiresAt.toISOString(),
      revokedAt: iso(r.revokedAt),
      lastViewedAt: iso(r.lastViewedAt),
      sentTo: r.sentTo,
    };
  }

  list(actor: AuthUser, jobId: number): OwnerLinkDto[] {
    this.access.read(actor, jobId);
    return this.repo.listForJob(actor.shopId, jobId).map((r) => this.toDto(r));
  }

  /**
   * A new link for the job; earlier links stop working so only one is live.
   * The token leaves the server only in this answer and in the e-mail or text.
   */
  create(actor: AuthUser, jobId: number, input: CreateOwnerLinkRequest): CreatedOwnerLinkDto {
    const job = this.access.read(actor, jobId);
    if (job.status === 'cancelled') throw new DomainError('CONFLICT', 'The job is cancelled; there is nothing for the owner to see.');
    const awaitingDecision = job.status === 'waiting_owner';
    // One transaction: the link, the message that carries it (text or e-mail outbox row and its task) and the audit entry.
    const { saved, url, mail } = this.uow.run((tx) => {
      const { row, url, expiresAt, now } = this.mint(actor, jobId, input.expiresInDays);
      publish(this.emitter, new OwnerLinkChangedEvent(tx, actor.shopId, jobId, row.id, 'created', now));
      const sent: OwnerLinkSent = input.send
        ? this.mailer.send({ shopId: actor.shopId, jobId, linkId: row.id, createdBy: actor.id, customerId: job.customerId, awaitingDecision, url, expiresAt })
        : { status: 'not_sent', reason: 'Not asked to send.' };
      const mail: CreatedOwnerLinkDto['mail'] =
        sent.status === 'queued' ? { status: 'queued', reason: null, channel: sent.channel } : { status: 'not_sent', reason: sent.reason, channel: null };
      const saved = sent.status === 'queued' ? this.repo.update(actor.shopId, row.id, { sentTo: sent.to }) : row;
      const details = { linkId: row.id, expiresAt: expiresAt.toISOString(), mail: mail.status, channel: mail.channel };
      this.audit.record(actor, { action: 'owner_link.created', entityType: 'job', entityId: jobId, details });
      return { saved, url, mail };
    });
    return { link: this.toDto(saved), url, mail };
  }

  /**
   * Sends a message that carries the owner's link (the report e-mail): the link is made exactly as desk's
   * "create" makes one (default lifetime, earlier links revoked, audited, recorded as sent to the
   * recipient) in one transaction with the message `send` queues, so both commit or neither. A cancelled
   * job has no owner page: `send` gets null.
   */
  sendWithLink<T extends { to: string }>(actor: AuthUser, jobId: number, send: (link: { url: string; expiresAt: Date } | null) => T): T {
    const job = this.access.read(actor, jobId);
    if (job.status === 'cancelled') return send(null);
    return this.uow.run((tx) => {
      const { row, url, expiresAt, now } = this.mint(actor, jobId, CreateOwnerLinkRequestSchema.parse({}).expiresInDays);
      publish(this.emitter, new OwnerLinkChangedEvent(tx, actor.shopId, jobId, row.id, 'created', now));
      const sent = send({ url, expiresAt });
      this.repo.update(actor.shopId, row.id, { sentTo: sent.to });
      const details = { linkId: row.id, expiresAt: expiresAt.toISOString(), mail: 'queued', with: 'report' };
      this.audit.record(actor, { action: 'owner_link.created', entityType: 'job', entityId: jobId, details });
      return sent;
    });
  }

  /**
   * For the "ready to collect" text, in the move's transaction: when the job has a live link, a fresh one made
   * as desk makes one (earlier links revoked, audited, recorded as sent to `to`), since only a link's hash is
   * stored; null when the job has none (the owner never had a page link, or it was revoked or expired).
   */
  renewForText(actor: Pick<AuthUser, 'shopId' | 'id'>, jobId: number, to: string, tx: DbTx): string | null {
    const now = this.clock.now().getTime();
    const live = this.repo.listForJob(actor.shopId, jobId).find((r) => !r.revokedAt && r.expiresAt.getTime() > now);
    if (!live) return null;
    const days = Math.max(CreateOwnerLinkRequestSchema.parse({}).expiresInDays, Math.ceil((live.expiresAt.getTime() - now) / DAY_MS));
    const { row, url, expiresAt, now: at } = this.mint(actor, jobId, days);
    publish(this.emitter, new OwnerLinkChangedEvent(tx, actor.shopId, jobId, row.id, 'created', at));
    this.repo.update(actor.shopId, row.id, { sentTo: to });
    const details = { linkId: row.id, expiresAt: expiresAt.toISOString(), mail: 'queued', channel: 'sms', with: 'ready_to_collect' };
    this.audit.record(actor, { action: 'owner_link.created', entityType: 'job', entityId: jobId, details });
    return url;
  }

  /** A new token for the job; its earlier links stop working. The URL is built from configuration only. */
  private mint(actor: Pick<AuthUser, 'shopId' | 'id'>, jobId: number, expiresInDays: number): { row: OwnerLinkRow; url: string; expiresAt: Date; now: Date } {
    const token = newOwnerToken(this.cfg.jwtSecret);
    const now = this.clock.now();
    const expiresAt = new Date(now.getTime() + expiresInDays * DAY_MS);
    const row = this.uow.run(() => {
      this.repo.revokeOpen(actor.shopId, jobId, now, actor.id);
      return this.repo.insert({ shopId: actor.shopId, jobId, tokenHash: hashOwnerToken(token), createdBy: actor.id, createdAt: now, expiresAt });
    });
    // From configuration only: a forged Host header must never end up in an e-mail.
    return { row, url: `${this.cfg.publicUrl}/o/${token}`, expiresAt, now };
  }

  revoke(actor: AuthUser, jobId: number, linkId: number): OwnerLinkDto {
    this.access.read(actor, jobId);
    const row = this.repo.find(actor.shopId, jobId, linkId);
    if (!row) throw notFound('Owner link');
    if (row.revokedAt) return this.toDto(row);
    const now = this.clock.now();
    const saved = this.uow.run((tx) => {
      const saved = this.repo.update(actor.shopId, linkId, { revokedAt: now, revokedBy: actor.id });
      publish(this.emitter, new OwnerLinkChangedEvent(tx, actor.shopId, jobId, linkId, 'revoked', now));
      this.audit.record(actor, { action: 'owner_link.revoked', entityType: 'job', entityId: jobId, details: { linkId } });
      return saved;
    });
    return this.toDto(saved);
  }

  /** The owner actor for a token, or a clear error: tampered/unknown, revoked, expired. */
  resolve(token: string): OwnerActor & { expiresAt: Date } {
    if (!ownerTokenSignatureOk(this.cfg.jwtSecret, token)) throw new DomainError('OWNER_LINK_INVALID');
    const row = this.repo.byTokenHash(hashOwnerToken(token));
    if (!row) throw new DomainError('OWNER_LINK_INVALID');
    if (row.revokedAt) throw new DomainError('OWNER_LINK_REVOKED');
    if (row.expiresAt.getTime() <= this.clock.now().getTime())
      throw new DomainError('OWNER_LINK_EXPIRED', undefined, { expiredAt: row.expiresAt.toISOString() });
    return { kind: 'owner', shopId: row.shopId, jobId: row.jobId, linkId: row.id, expiresAt: row.expiresAt };
  }

  /** Every page view: kept on the link for staff, audited, and pushed to the job page. */
  viewed(owner: OwnerActor): void {
    const now = this.clock.now();
    this.uow.run((tx) => {
      this.repo.update(owner.shopId, owner.linkId, { lastViewedAt: now });
      publish(this.emitter, new OwnerPageViewedEvent(tx, owner.shopId, owner.jobId, owner.linkId, now));
      this.audit.record(
        { shopId: owner.shopId, id: null },
        { action: 'owner.viewed', entityType: 'job', entityId: owner.jobId, details: { linkId: owner.linkId } },
      );
    });
  }
}
