import { Inject, Injectable } from '@nestjs/common';
import type { CreateUserRequest, UpdateUserRequest, UserDto } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { SessionStore, type AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { hashPassword, verifyPassword } from './password';
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

  async create(actor: AuthUser, input: CreateUserRequest): Promise<UserDto> {
    const email = input.email.trim().toLowerCase();
    if (this.repo.findByEmail(email)) throw new DomainError('EMAIL_TAKEN', undefined, { field: 'email' });
    const passwordHash = await hashPassword(input.password);
    const row = this.uow.run(() => {
      const saved = this.repo.insert({
        shopId: actor.shopId,
        email,
        name: input.name.trim(),
        role: input.role,
        passwordHash,
        active: true,
        createdAt: this.clock.now(),
      });
      this.audit.record(actor, { action: 'user.created', entityType: 'user', entityId: saved.id, details: { role: saved.role } });
      return saved;
    });
    return toDto(row);
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
    const passwordHash = await hashPassword(newPassword);
    this.uow.run(() => {
      this.repo.setPasswordHash(actor.shopId, actor.id, passwordHash);
      this.sessions.endAllOf(actor.shopId, actor.id);
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
    return ok && user?.active ? { id: user.id, shopId: user.shopId, role: user.role, email: user.email, name: user.name } : null;
  }

  private dummy?: Promise<string>;
  private dummyHash(): Promise<string> {
    this.dummy ??= hashPassword('not-a-real-password-for-timing');
    return this.dummy;
  }

  private activeManagers(shopId: number): number {
    return this.repo.listByShop(shopId).filter((u) => u.active && u.role === 'manager').length;
  }
}
