import { Inject, Injectable } from '@nestjs/common';
import { AuditService } from '../audit';
import { AuthService, type SignInOutcome } from '../auth';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError, notFound } from '../core/http';
import { MailService, passwordResetMail } from '../mail';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import { AccountLinks } from './account-links.service';
import { ResetThrottle } from './reset-throttle';

/** A reset link works for 30 minutes. */
export const RESET_MINUTES = 30;

/**
 * Forgotten passwords: a single-use link (hash stored, 30 minutes) through the outbox. The answer to
 * a request is the same whether or not the address has an account; using the link ends every session
 * of that user (through the session store) and signs in on the device that used it.
 */
@Injectable()
export class PasswordResetsService {
  constructor(
    private readonly links: AccountLinks,
    private readonly uow: UnitOfWork,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly mail: MailService,
    private readonly auth: AuthService,
    private readonly throttle: ResetThrottle,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** "Forgot your password?": mails a link when the address has an active account, says nothing either way. */
  async request(email: string, address: string): Promise<void> {
    const account = email.trim().toLowerCase();
    await this.throttle.take(account, address);
    const user = this.users.activeByEmail(account);
    if (user) this.issue(user, null);
  }

  /** A manager sends a staff member of their shop a reset link (their password is never seen). */
  sendFor(manager: AuthUser, userId: number): void {
    const user = this.users.activeIdentity(manager.shopId, userId);
    if (!user) throw notFound('User');
    this.issue(user, manager);
  }

  /** Sets the new password once; every session of the user ends, and this device signs in (second factor permitting). */
  async use(token: string, password: string): Promise<SignInOutcome> {
    const row = this.links.check('password_reset', token);
    const user = this.users.activeIdentity(row.shopId, row.userId);
    if (!user) throw new DomainError('LINK_INVALID');
    const hash = await this.users.hashNewPassword(password, { userName: user.name, email: user.email, shopName: this.shops.settings(user.shopId).name });
    this.uow.run(() => {
      this.links.use(row.id);
      this.users.replacePassword(user.shopId, user.id, hash);
    });
    this.audit.record(user, { action: 'user.password_reset', entityType: 'user', entityId: user.id, details: {} });
    return this.auth.afterPassword(user);
  }

  private issue(user: AuthUser, byManager: AuthUser | null): void {
    const shop = this.shops.settings(user.shopId);
    this.uow.run((tx) => {
      const token = this.links.create({ shopId: user.shopId, userId: user.id }, 'password_reset', RESET_MINUTES * 60_000);
      const link = `${this.cfg.appOrigin}/reset-password#${token}`;
      const rendered = passwordResetMail({ shop, name: user.name, link, minutes: RESET_MINUTES, byManager: byManager?.name ?? null });
      this.mail.queue(
        {
          shopId: user.shopId,
          jobId: null,
          kind: 'password_reset',
          to: user.email,
          ...rendered,
          attachments: [],
          createdBy: byManager?.id ?? null,
          secrets: [link],
        },
        tx,
      );
      if (byManager) this.audit.record(byManager, { action: 'user.reset_link_sent', entityType: 'user', entityId: user.id, details: {} });
    });
  }
}
