import { Inject, Injectable } from '@nestjs/common';
import type { NewShop, SetupRequest, SetupStatus, SignupRequest } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { AuthService, type SignInOutcome } from '../auth';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { MailService, signupConfirmMail } from '../mail';
import { AccountLinks } from '../password-resets';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import { SetupCode } from './setup-code';

/** A sign-up confirmation link works for 48 hours. */
export const SIGNUP_LINK_HOURS = 48;

/** First-run setup of the only shop, and (SIGNUP=open) self-service sign-up of more shops with a confirmed e-mail. */
@Injectable()
export class SetupService {
  constructor(
    private readonly code: SetupCode,
    private readonly uow: UnitOfWork,
    private readonly shops: ShopsService,
    private readonly users: UsersService,
    private readonly auth: AuthService,
    private readonly links: AccountLinks,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  status(): SetupStatus {
    return { setupOpen: !this.shops.anyShop(), signupOpen: this.cfg.SIGNUP === 'open' };
  }

  /** The first shop and its manager, signed in at once. Gone (404) as soon as any shop exists. */
  async setUp(input: SetupRequest): Promise<SignInOutcome> {
    if (this.shops.anyShop()) throw new DomainError('NOT_FOUND');
    if (!this.code.matches(input.code)) throw new DomainError('SETUP_CODE_INVALID', undefined, { field: 'code' });
    const hash = await this.passwordHash(input);
    const manager = this.uow.run(() => {
      // Checked again inside the write: two setups racing cannot both make a first shop.
      if (this.shops.anyShop()) throw new DomainError('NOT_FOUND');
      return this.createShop(input.shop, input.manager, hash, true);
    });
    this.code.forget();
    return this.auth.afterPassword(manager);
  }

  /** A new workshop on a hosted server: made inactive, with a confirmation link to the manager's address. */
  async signUp(input: SignupRequest): Promise<void> {
    if (this.cfg.SIGNUP !== 'open') throw new DomainError('NOT_FOUND');
    if (this.users.emailTaken(input.manager.email)) return; // same answer as success: nothing reveals which addresses have accounts
    const hash = await this.passwordHash(input);
    this.uow.run((tx) => {
      const manager = this.createShop(input.shop, input.manager, hash, false);
      const token = this.links.create({ shopId: manager.shopId, userId: manager.id }, 'signup_verify', SIGNUP_LINK_HOURS * 3600_000);
      const link = `${this.cfg.appOrigin}/signup/confirm#${token}`;
      const rendered = signupConfirmMail({ shop: this.shops.settings(manager.shopId), name: manager.name, link, hours: SIGNUP_LINK_HOURS });
      this.mail.queue({ shopId: manager.shopId, jobId: null, kind: 'signup_confirm', to: manager.email, ...rendered, attachments: [], secrets: [link] }, tx);
    });
  }

  /** The confirmation link: the manager's account goes live and signs in. */
  async confirm(token: string): Promise<SignInOutcome> {
    const link = this.links.check('signup_verify', token);
    this.uow.run(() => {
      this.links.use(link.id);
      this.users.activate(link.shopId, link.userId);
    });
    const manager = this.users.activeIdentity(link.shopId, link.userId);
    if (!manager) throw new DomainError('LINK_INVALID');
    this.audit.record(manager, { action: 'shop.signup_confirmed', entityType: 'shop', entityId: manager.shopId, details: {} });
    return this.auth.afterPassword(manager);
  }

  private passwordHash(input: SignupRequest): Promise<string> {
    return this.users.hashNewPassword(
      input.manager.password,
      { userName: input.manager.name, email: input.manager.email, shopName: input.shop.name },
      'manager.password',
    );
  }

  private createShop(shop: NewShop, manager: SignupRequest['manager'], passwordHash: string, active: boolean): AuthUser {
    const created = this.shops.create(shop);
    const user = this.users.insertAccount({ shopId: created.id, email: manager.email, name: manager.name, role: 'manager', passwordHash, active });
    this.audit.record(user, { action: 'shop.created', entityType: 'shop', entityId: created.id, details: { via: active ? 'setup' : 'signup' } });
    return user;
  }
}
