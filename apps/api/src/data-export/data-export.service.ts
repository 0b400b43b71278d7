import { Inject, Injectable } from '@nestjs/common';
import type { Readable } from 'node:stream';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import type { AuthUser } from '../core/auth';
import { openReadSnapshot } from '../core/db';
import { notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { STORAGE, type Storage } from '../infra/storage';
import type { ExportScope } from './export-scope';
import { exportZip } from './export-zip';

/** Everything of a shop, or one customer's own data, as a streamed zip (manager: shop; manager and desk: a customer). */
@Injectable()
export class DataExportService {
  constructor(
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly audit: AuditService,
  ) {}

  shop(actor: AuthUser): { stream: Readable; filename: string } {
    const stream = this.zip({ kind: 'shop', shopId: actor.shopId });
    this.audit.record(actor, { action: 'shop.exported', entityType: 'shop', entityId: actor.shopId });
    return { stream, filename: `shop-${actor.shopId}-export-${this.stamp()}.zip` };
  }

  customer(actor: AuthUser, customerId: number): { stream: Readable; filename: string } {
    const stream = this.zip({ kind: 'customer', shopId: actor.shopId, customerId });
    this.audit.record(actor, { action: 'customer.exported', entityType: 'customer', entityId: customerId });
    return { stream, filename: `customer-${customerId}-export-${this.stamp()}.zip` };
  }

  private zip(scope: ExportScope): Readable {
    const snap = openReadSnapshot(this.cfg.DATABASE_PATH);
    try {
      if (scope.kind === 'customer' && !snap.db.prepare('SELECT 1 FROM customers WHERE id = ? AND shop_id = ?').get(scope.customerId, scope.shopId))
        throw notFound('Customer');
      const out = exportZip(snap.db, this.storage, scope, this.clock.now());
      out.once('close', snap.close);
      out.once('end', snap.close);
      out.once('error', snap.close);
      return out;
    } catch (err) {
      snap.close();
      throw err;
    }
  }

  private stamp(): string {
    return this.clock.now().toISOString().slice(0, 10);
  }
}
