import { Injectable } from '@nestjs/common';
import type { ShopSettingsDto, UpdateShopSettingsRequest } from '@benchproof/contracts';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { type ShopRow, ShopsRepository } from './shops.repository';

const toDto = (s: ShopRow): ShopSettingsDto => ({
  id: s.id,
  name: s.name,
  address: s.address,
  email: s.email,
  phone: s.phone,
  labourRateMinor: s.labourRateMinor,
  taxRateBp: s.taxRateBp,
  currency: s.currency,
  units: s.units,
  pageSize: s.pageSize,
  finalCheckSecondPerson: s.finalCheckSecondPerson,
  chainLimits: s.chainLimits ?? null,
  brandPrimary: s.brandPrimary,
  brandAccent: s.brandAccent,
  reportFooter: s.reportFooter,
});

/** The shop is the tenant: its settings drive money, units, chain limits and the report. */
@Injectable()
export class ShopsService {
  constructor(
    private readonly repo: ShopsRepository,
    private readonly audit: AuditService,
  ) {}

  settings(shopId: number): ShopSettingsDto {
    const shop = this.repo.find(shopId);
    if (!shop) throw notFound('Shop');
    return toDto(shop);
  }

  update(actor: AuthUser, patch: UpdateShopSettingsRequest): ShopSettingsDto {
    const updated = this.repo.update(actor.shopId, patch);
    this.audit.record(actor, { action: 'shop.settings_updated', entityType: 'shop', entityId: actor.shopId, details: { fields: Object.keys(patch) } });
    return toDto(updated);
  }

  /** The next job sequence number for this shop, used once. */
  takeJobSeq(shopId: number): number {
    return this.repo.takeJobSeq(shopId);
  }
}
