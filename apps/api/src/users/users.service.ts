import { Inject, Injectable } from '@nestjs/common';
import type { UpdateUserRequest, UserDto } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { SessionStore, type AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { hashPassword, verifyPassword } from './password';
import { assertStrongPassword, type PasswordContext } from './password-policy';
import { identityOf, type NewAccount, type TotpState, totpStateOf } from './users-accounts';
import { type UserRow, UsersRepository } from './users.repository';
import { UnitOfWork } from '../core/db';

const toDto = (u: UserRow): UserDto => ({ id: u.id, name: u.name, email: u.email, role: u.role, active: u.active, createdAt: u.createdAt.toISOString() });

@Injectable()
export class UsersService {
  constructor(
    private readonly repo: UsersRepository,
    private readonly uow: UnitOfWork,
    private readonly audit: AuditService,
    private readonly sessions: SessionStore,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  list(actor: AuthUser): UserDto[] {
    return this.repo.listByShop(actor.shopId).map(toDto);
  }

  /** An active staff member as a caller, for work done later on their behalf (background tasks carry only the id). */
  identity(shopId: number, id: number): AuthUser | null {
    const u = this.repo.findInShop(shopId, id);
    return u?.active ? { id: u.id, shopId: u.shopId, role: u.role, email: u.email, name: u.name } : null;
  }

  /** Staff of the caller's shop, for pickers such as the assigned mechanic. */
  get(actor: AuthUser, id: number): UserDto {
    const user = this.repo.findInShop(actor.shopId, id);
    if (!user) throw notFound('User');
    return toDto(user);
  }

  /** Checks a chosen password (WEAK_PASSWORD) and hashes it; the async half of making or changing an account. */
  async hashNewPassword(password: string, ctx: PasswordContext, field = 'password'): Promise<string> {
    assertStrongPassword(password, ctx, field);
    return hashPassword(password);
  }

  /** Inserts an account (setup, accepted invitation, sign-up); call inside the cause's transaction. */
  insertAccount(account: NewAccount): AuthUser {
    const email = account.email.trim().toLowerCase();
    if (this.repo.findByEmail(email)) throw new DomainError('EMAIL_TAKEN', undefined, { field: 'email' });
    return identityOf(this.repo.insert({ ...account, email, name: account.name.trim(), createdAt: this.clock.now() }));
  }

  /** Whether an address already has an account (invitations and sign-up refuse it). */
  emailTaken(email: string): boolean {
    return Boolean(this.repo.findByEmail(email.trim().toLowerCase()));
  }

  /** The active account for an address, or null (password reset). */
  activeByEmail(email: string): AuthUser | null {
    const u = this.repo.findByEmail(email.trim().toLowerCase());
    return u?.active ? identityOf(u) : null;
  }

  /** The identity of an active user of a shop, or null. */
  activeIdentity(shopId: number, id: number): AuthUser | null {
    const u = this.repo.findInShop(shopId, id);
    return u?.active ? identityOf(u) : null;
  }

  /** Whether this is the user's current password (turning the second factor off asks again). */
  async passwordMatches(user: AuthUser, password: string): Promise<boolean> {
    const row = this.repo.findInShop(user.shopId, user.id);
    return Boolean(row && (await verifyPassword(row.passwordHash, password)));
  }

  /** Turns on an account whose owner confirmed their e-mail (self-service sign-up). */
  activate(shopId: number, id: number): void {
    this.repo.update(shopId, id, { active: true });
  }

  /** Sets a new password (already checked and hashed) and ends every session of the user. */
  replacePassword(shopId: number, id: number, passwordHash: string): void {
    this.repo.setPasswordHash(shopId, id, passwordHash);
    this.sessions.endAllOf(shopId, id);
  }

  totpState(shopId: number, id: number): TotpState {
    const u = this.repo.findInShop(shopId, id);
    if (!u) throw notFound('User');
    return totpStateOf(u);
  }

  /** Stores (or clears) the sealed TOTP secret and whether it is confirmed. */
  setTotp(shopId: number, id: number, sealedSecret: string | null, enabled: boolean): void {
    this.repo.setTotp(shopId, id, { totpSecret: sealedSecret, totpEnabledAt: enabled ? this.clock.now() : null, totpLastStep: null });
  }

  /** Takes a TOTP time step once (replay guard); false when it or a later one was already used. */
  takeTotpStep(shopId: number, id: number, step: number): boolean {
    return this.repo.takeTotpStep(shopId, id, step);
  }

  /** Ids of the shop's active users without a confirmed second factor. */
  withoutTwoFactor(shopId: number): number[] {
    return this.repo
      .listByShop(shopId)
      .filter((u) => u.active && !u.totpEnabledAt)
      .map((u) => u.id);
  }

  update(actor: AuthUser, id: number, patch: UpdateUserRequest): UserDto {
    const updated = this.uow.run(() => {
      const user = this.repo.findInShop(actor.shopId, id);
      if (!user) throw notFound('User');
      const losesManager = user.role === 'manager' && user.active && (patch.active === false || (patch.role && patch.role !== 'manager'));
      if (losesManager && this.activeManagers(actor.shopId) <= 1) throw new DomainError('LAST_MANAGER');
      const row = this.repo.update(actor.shopId, id, patch);
      // A deactivated user's tokens must not come back to life when the account is re-activated.
      if (patch.active === false) this.sessions.endAllOf(actor.shopId, id);
      else this.sessions.userChanged(id);
      this.audit.record(actor, { action: 'user.updated', entityType: 'user', entityId: id, details: { ...patch } });
      return row;
    });
    return toDto(updated);
  }

  /** Sets the caller's own password after checking the current one, and ends all their sessions. */
  async changePassword(actor: AuthUser, currentPassword: string, newPassword: string): Promise<void> {
    const user = this.repo.findInShop(actor.shopId, actor.id);
    if (!user || !(await verifyPassword(user.passwordHash, currentPassword))) {
      throw new DomainError('INVALID_CREDENTIALS', 'The current password is not right.', { field: 'currentPassword' });
    }
    const passwordHash = await this.hashNewPassword(
      newPassword,
      { userName: user.name, email: user.email, shopName: this.shopName(actor.shopId) },
      'newPassword',
    );
    this.uow.run(() => {
      this.replacePassword(actor.shopId, actor.id, passwordHash);
      this.audit.record(actor, { action: 'user.password_changed', entityType: 'user', entityId: actor.id, details: {} });
    });
  }

  /**
   * The staff member for these credentials, or null. Unknown e-mails still pay for
   * one hash check so response times do not reveal which addresses have accounts.
   * The password hash never leaves this feature: callers get the session identity only.
   */
  async verifyCredentials(email: string, password: string): Promise<AuthUser | null> {
    const user = this.repo.findByEmail(email.trim().toLowerCase());
    const ok = await verifyPassword(user?.passwordHash ?? (await this.dummyHash()), password);
    return ok && user?.active ? identityOf(user) : null;
  }

  private dummy?: Promise<string>;
  private dummyHash(): Promise<string> {
    this.dummy ??= hashPassword('not-a-real-password-for-timing');
    return this.dummy;
  }

  private shopName(shopId: number): string {
    return this.repo.shopName(shopId);
  }

  private activeManagers(shopId: number): number {
    return this.repo.listByShop(shopId).filter((u) => u.active && u.role === 'manager').length;
  }
}
