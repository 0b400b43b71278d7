import { Inject, Injectable } from '@nestjs/common';
import { hashLinkToken, newLinkToken } from '../core/auth';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import type { AccountTokenPurpose } from '../db/schema';
import { AccountTokensRepository } from './account-tokens.repository';

/** Who a redeemed link was for. */
export interface LinkOwner {
  shopId: number;
  userId: number;
}

/**
 * Single-use links for existing accounts: a new one retires the user's earlier open ones of the same
 * purpose; redeeming checks expiry and marks it used in one conditional UPDATE inside the caller's
 * transaction, so a change that fails leaves the link usable and two uses of one link cannot both win.
 */
@Injectable()
export class AccountLinks {
  constructor(
    private readonly repo: AccountTokensRepository,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Call inside the transaction that queues the e-mail carrying the token. */
  create(owner: LinkOwner, purpose: AccountTokenPurpose, ttlMs: number): string {
    const token = newLinkToken();
    const now = this.clock.now();
    this.repo.retireOpen(owner.shopId, owner.userId, purpose, now);
    this.repo.insert({ ...owner, purpose, tokenHash: hashLinkToken(token), createdAt: now, expiresAt: new Date(now.getTime() + ttlMs) });
    return token;
  }

  /** The link's owner if it is open (LINK_INVALID / LINK_EXPIRED otherwise); does not use it. */
  check(purpose: AccountTokenPurpose, token: string): LinkOwner & { id: number } {
    const row = this.repo.byHash(purpose, hashLinkToken(token));
    if (!row || row.usedAt) throw new DomainError('LINK_INVALID');
    if (row.expiresAt.getTime() <= this.clock.now().getTime()) throw new DomainError('LINK_EXPIRED');
    return { id: row.id, shopId: row.shopId, userId: row.userId };
  }

  /** Uses a checked link; throws LINK_INVALID when another request used it first. */
  use(id: number): void {
    if (!this.repo.use(id, this.clock.now())) throw new DomainError('LINK_INVALID');
  }
}
