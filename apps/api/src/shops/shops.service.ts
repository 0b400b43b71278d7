import { Inject, Injectable } from '@nestjs/common';
import type { NewShop, ShopSettingsDto, UpdateShopSettingsRequest } from '@benchproof/contracts';
import { shopLocale } from '@benchproof/domain';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { type ShopRow, ShopsRepository } from './shops.repository';
import { UnitOfWork } from '../core/db';

const toDto = (s: ShopRow): ShopSettingsDto => ({
  id: s.id,
  name: s.name,
  address: s.address,
  email: s.email,
  phone: s.phone,
  labourRateMinor: s.labourRateMinor,
  taxRateBp: s.taxRateBp,
  currency: s.currency,
  locale: s.locale ?? null,
  dateLocale: shopLocale(s),
  country: s.country,
  taxNumber: s.taxNumber,
  units: s.units,
  pageSize: s.pageSize,
  finalCheckSecondPerson: s.finalCheckSecondPerson,
  chainLimits: s.chainLimits ?? null,
  brandPrimary: s.brandPrimary,
  brandAccent: s.brandAccent,
  reportFooter: s.reportFooter,
  showcaseDeskAccess: s.showcaseDeskAccess,
  requireTwoFactor: s.requireTwoFactor,
  logo: s.logoKey && s.logoWidth && s.logoHeight ? { url: `/api/shop/logo?v=${s.logoSha256?.slice(0, 12)}`, width: s.logoWidth, height: s.logoHeight } : null,
});

/** The stored report logo of a shop. */
export interface ShopLogo {
  key: string;
  sha256: string;
  width: number;
  height: number;
}

/** The shop is the tenant: its settings drive money, units, chain limits and the report. */
@Injectable()
export class ShopsService {
  constructor(
    private readonly uow: UnitOfWork,
    private readonly repo: ShopsRepository,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  settings(shopId: number): ShopSettingsDto {
    const shop = this.repo.find(shopId);
    if (!shop) throw notFound('Shop');
    return toDto(shop);
  }

  update(actor: AuthUser, patch: UpdateShopSettingsRequest): ShopSettingsDto {
    const updated = this.uow.run(() => {
      const saved = this.repo.update(actor.shopId, patch);
      this.audit.record(actor, { action: 'shop.settings_updated', entityType: 'shop', entityId: actor.shopId, details: { fields: Object.keys(patch) } });
      return saved;
    });
    return toDto(updated);
  }

  /** Makes a new shop (first-run setup, self-service sign-up); call inside the cause's transaction. */
  create(input: NewShop): ShopSettingsDto {
    return toDto(this.repo.insert({ ...input, createdAt: this.clock.now() }));
  }

  /** Whether the shop exists at all (setup is open only while none does). */
  anyShop(): boolean {
    return this.repo.any();
  }

  requiresTwoFactor(shopId: number): boolean {
    return this.repo.find(shopId)?.requireTwoFactor ?? false;
  }

  setRequireTwoFactor(actor: AuthUser, required: boolean): void {
    this.repo.update(actor.shopId, { requireTwoFactor: required });
    this.audit.record(actor, { action: 'shop.two_factor_required', entityType: 'shop', entityId: actor.shopId, details: { required } });
  }

  /** The shop's report logo, or null when none was uploaded. */
  logo(shopId: number): ShopLogo | null {
    const s = this.repo.find(shopId);
    if (!s?.logoKey || !s.logoSha256 || !s.logoWidth || !s.logoHeight) return null;
    return { key: s.logoKey, sha256: s.logoSha256, width: s.logoWidth, height: s.logoHeight };
  }

  /** Records a new logo (null removes it); returns the previous one so the caller can delete its file. */
  setLogo(actor: AuthUser, logo: ShopLogo | null): { settings: ShopSettingsDto; previous: ShopLogo | null } {
    const previous = this.logo(actor.shopId);
    const updated = this.uow.run(() => {
      const saved = this.repo.update(actor.shopId, {
        logoKey: logo?.key ?? null,
        logoSha256: logo?.sha256 ?? null,
        logoWidth: logo?.width ?? null,
        logoHeight: logo?.height ?? null,
      });
      this.audit.record(actor, {
        action: logo ? 'shop.logo_set' : 'shop.logo_removed',
        entityType: 'shop',
        entityId: actor.shopId,
        details: { sha256: logo?.sha256 ?? null },
      });
      return saved;
    });
    return { settings: toDto(updated), previous };
  }

  /** The next job sequence number for this shop, used once. */
  takeJobSeq(shopId: number): number {
    return this.repo.takeJobSeq(shopId);
  }
}
