import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { auditEvents } from '../db/schema';

export type NewAuditEvent = typeof auditEvents.$inferInsert;

@Injectable()
export class AuditRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(event: NewAuditEvent): void {
    this.db.insert(auditEvents).values(event).run();
  }

  list(shopId: number, entityType?: string, entityId?: number, limit = 100) {
    const where = [eq(auditEvents.shopId, shopId)];
    if (entityType) where.push(eq(auditEvents.entityType, entityType));
    if (entityId) where.push(eq(auditEvents.entityId, entityId));
    return this.db
      .select()
      .from(auditEvents)
      .where(and(...where))
      .orderBy(desc(auditEvents.at), desc(auditEvents.id))
      .limit(limit)
      .all();
  }
}
