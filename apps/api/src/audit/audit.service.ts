import { Inject, Injectable } from '@nestjs/common';
import type { AuthUser } from '../core/auth';
import { CLOCK, type Clock } from '../core/clock';
import { AuditRepository } from './audit.repository';

export interface AuditEntry {
  action: string;
  entityType: string;
  entityId?: number | null;
  details?: Record<string, unknown>;
}

/** Who did what, when: media, consent, reports, users and status changes write here. */
@Injectable()
export class AuditService {
  constructor(
    private readonly repo: AuditRepository,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  record(actor: Pick<AuthUser, 'id' | 'shopId'> | { shopId: number; id: null }, entry: AuditEntry): void {
    this.repo.insert({
      shopId: actor.shopId,
      userId: actor.id,
      action: entry.action,
      entityType: entry.entityType,
      entityId: entry.entityId ?? null,
      details: entry.details ?? null,
      at: this.clock.now(),
    });
  }

  list(shopId: number, entityType?: string, entityId?: number) {
    return this.repo.list(shopId, entityType, entityId).map((e) => ({
      id: e.id,
      userId: e.userId,
      action: e.action,
      entityType: e.entityType,
      entityId: e.entityId,
      details: e.details ?? null,
      at: e.at.toISOString(),
    }));
  }
}
