import { Inject, Injectable } from '@nestjs/common';
import { defaultLocaleFor, formatShopDate, ROLE_LABELS, type InvitationDto, type InvitationPreview, type InviteRequest } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { AuthService, type SignInOutcome } from '../auth';
import { APP_CONFIG, type AppConfig } from '../config';
import { hashLinkToken, newLinkToken, type AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import type { DbTx } from '../core/db';
import { invitationMail, MailService } from '../mail';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import { type InvitationRow, InvitationsRepository } from './invitations.repository';

/** An invitation link works for 7 days. */
export const INVITATION_DAYS = 7;
const DAY_MS = 24 * 3600 * 1000;

/**
 * A manager invites staff by e-mail; the person chooses their own password through a single-use link
 * (only its hash is stored). The account is made when the link is used, so a withdrawn or expired
 * invitation leaves nothing behind that could sign in.
 */
@Injectable()
export class InvitationsService {
  constructor(
    private readonly repo: InvitationsRepository,
    private readonly uow: UnitOfWork,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly mail: MailService,
    private readonly auth: AuthService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  pending(actor: AuthUser): InvitationDto[] {
    return this.repo.pending(actor.shopId).map((r) => this.toDto(r));
  }

  invite(actor: AuthUser, input: InviteRequest): InvitationDto {
    const email = input.email.trim().toLowerCase();
    if (this.users.emailTaken(email)) throw new DomainError('EMAIL_TAKEN', undefined, { field: 'email' });
    if (this.repo.pendingFor(actor.shopId, email))
      throw new DomainError('CONFLICT', 'This address already has an open invitation: resend it instead.', { field: 'email' });
    const token = newLinkToken();
    const now = this.clock.now();
    const row = this.uow.run((tx) => {
      const inv = this.repo.insert({
        shopId: actor.shopId,
        email,
        name: input.name.trim(),
        role: input.role,
        tokenHash: hashLinkToken(token),
        invitedBy: actor.id,
        createdAt: now,
        sentAt: now,
        expiresAt: new Date(now.getTime() + INVITATION_DAYS * DAY_MS),
      });
      this.send(actor, inv, token, tx);
      this.audit.record(actor, { action: 'invitation.sent', entityType: 'invitation', entityId: inv.id, details: { role: inv.role } });
      return inv;
    });
    return this.toDto(row);
  }

  /** A new link (the old one stops working) and 7 more days. */
  resend(actor: AuthUser, id: number): InvitationDto {
    const token = newLinkToken();
    const now = this.clock.now();
    const row = this.uow.run((tx) => {
      this.open(actor, id);
      const inv = this.repo.update(actor.shopId, id, {
        tokenHash: hashLinkToken(token),
        sentAt: now,
        expiresAt: new Date(now.getTime() + INVITATION_DAYS * DAY_MS),
      });
      this.send(actor, inv, token, tx);
      this.audit.record(actor, { action: 'invitation.resent', entityType: 'invitation', entityId: id, details: {} });
      return inv;
    });
    return this.toDto(row);
  }

  withdraw(actor: AuthUser, id: number): void {
    this.open(actor, id);
    this.repo.update(actor.shopId, id, { withdrawnAt: this.clock.now() });
    this.audit.record(actor, { action: 'invitation.withdrawn', entityType: 'invitation', entityId: id, details: {} });
  }

  /** What the link's page shows before the person chooses a password. */
  preview(token: string): InvitationPreview {
    const inv = this.usable(token);
    return { shopName: this.shops.settings(inv.shopId).name, name: inv.name, email: inv.email, role: inv.role };
  }

  /** Makes the account with the chosen password and signs in (through the second-factor step if the shop requires it). */
  async accept(token: string, password: string): Promise<SignInOutcome> {
    const inv = this.usable(token);
    const passwordHash = await this.users.hashNewPassword(password, { userName: inv.name, email: inv.email, shopName: this.shops.settings(inv.shopId).name });
    const user = this.uow.run(() => {
      const made = this.users.insertAccount({ shopId: inv.shopId, email: inv.email, name: inv.name, role: inv.role, passwordHash, active: true });
      if (!this.repo.accept(inv.id, made.id, this.clock.now())) throw new DomainError('LINK_INVALID');
      this.audit.record(made, { action: 'invitation.accepted', entityType: 'invitation', entityId: inv.id, details: { role: inv.role } });
      return made;
    });
    return this.auth.afterPassword(user);
  }

  private usable(token: string): InvitationRow {
    const inv = this.repo.byTokenHash(hashLinkToken(token));
    if (!inv || inv.acceptedAt || inv.withdrawnAt) throw new DomainError('LINK_INVALID');
    if (inv.expiresAt.getTime() <= this.clock.now().getTime()) throw new DomainError('LINK_EXPIRED');
    return inv;
  }

  private open(actor: AuthUser, id: number): InvitationRow {
    const inv = this.repo.find(actor.shopId, id);
    if (!inv || inv.acceptedAt || inv.withdrawnAt) throw notFound('Invitation');
    return inv;
  }

  private send(actor: AuthUser, inv: InvitationRow, token: string, tx: DbTx): void {
    const shop = this.shops.settings(actor.shopId);
    const link = `${this.cfg.appOrigin}/join#${token}`;
    const expiresOn = formatShopDate(inv.expiresAt, defaultLocaleFor(shop.currency));
    const rendered = invitationMail({ shop, name: inv.name, roleLabel: ROLE_LABELS[inv.role], inviterName: actor.name, link, expiresOn });
    this.mail.queue(
      { shopId: actor.shopId, jobId: null, kind: 'invitation', to: inv.email, ...rendered, attachments: [], createdBy: actor.id, secrets: [link] },
      tx,
    );
  }

  private toDto(r: InvitationRow): InvitationDto {
    const expired = r.expiresAt.getTime() <= this.clock.now().getTime();
    return { id: r.id, name: r.name, email: r.email, role: r.role, sentAt: r.sentAt.toISOString(), expiresAt: r.expiresAt.toISOString(), expired };
  }
}
