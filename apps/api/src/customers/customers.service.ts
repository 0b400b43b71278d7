import { Inject, Injectable } from '@nestjs/common';
import type { CustomerInput, CustomerDto, CustomerListQuery, CustomerPage, UpdateCustomerRequest } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { ShopsService } from '../shops';
import { type CustomerRow, CustomersRepository } from './customers.repository';
import { normalisePhone, toE164 } from './phone-number';

export const toCustomerDto = (c: CustomerRow): CustomerDto => ({
  id: c.id,
  name: c.name,
  email: c.email || null,
  phone: c.phone || null,
  preferredChannel: c.preferredChannel,
  notes: c.notes || null,
  createdAt: c.createdAt.toISOString(),
  textsStoppedAt: c.smsOptOutAt?.toISOString() ?? null,
});

/** Contract nulls are stored as '' so the columns stay simple to search. */
const toColumns = (input: CustomerInput) => ({
  name: input.name,
  email: input.email ?? '',
  phone: input.phone ?? '',
  preferredChannel: input.preferredChannel,
  notes: input.notes ?? '',
});

/** Bike owners of the caller's shop. */
@Injectable()
export class CustomersService {
  constructor(
    private readonly repo: CustomersRepository,
    private readonly shops: ShopsService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  list(actor: AuthUser, query: CustomerListQuery): CustomerPage {
    const { rows, total } = this.repo.page(actor.shopId, query);
    return { items: rows.map(toCustomerDto), total, page: query.page, pageSize: query.pageSize };
  }

  get(actor: Pick<AuthUser, 'shopId'>, id: number): CustomerDto {
    const row = this.repo.find(actor.shopId, id);
    if (!row) throw notFound('Customer');
    return toCustomerDto(row);
  }

  /**
   * Desk's entry: the phone is stored in E.164 read with the shop's country, and an invalid number is
   * refused (PHONE_INVALID). An import keeps a number it cannot read as typed (`keepUnreadablePhone`):
   * its preview already listed the rows, and such a number simply gets no texts.
   */
  create(actor: Pick<AuthUser, 'shopId'>, input: CustomerInput, opts: { keepUnreadablePhone?: boolean } = {}): CustomerDto {
    const now = this.clock.now();
    const country = this.country(actor.shopId);
    const phone = opts.keepUnreadablePhone && input.phone ? (toE164(input.phone, country) ?? input.phone) : normalisePhone(input.phone, country);
    const row = this.repo.insert({ ...toColumns({ ...input, phone }), shopId: actor.shopId, createdAt: now, updatedAt: now });
    return toCustomerDto(row);
  }

  /** A number left as it was is not read again (records from before numbers were checked stay editable). */
  update(actor: AuthUser, id: number, patch: UpdateCustomerRequest): CustomerDto {
    const before = this.repo.find(actor.shopId, id);
    if (!before) throw notFound('Customer');
    const phone = patch.phone !== null && patch.phone === before.phone ? patch.phone : normalisePhone(patch.phone, this.country(actor.shopId));
    const row = this.repo.update(actor.shopId, id, { ...toColumns({ ...patch, phone }), updatedAt: this.clock.now() });
    if (!row) throw notFound('Customer');
    return toCustomerDto(row);
  }

  /** The customer's number for texts (E.164), why there is none, or that they replied STOP. */
  textNumber(actor: Pick<AuthUser, 'shopId'>, id: number): { number: string | null; optedOut: boolean } {
    const row = this.repo.find(actor.shopId, id);
    if (!row) throw notFound('Customer');
    return { number: row.phone ? toE164(row.phone, this.country(actor.shopId)) : null, optedOut: row.smsOptOutAt !== null };
  }

  /** The owner's STOP (a time) or START (null) reply to a text. */
  setTextOptOut(scope: Pick<AuthUser, 'shopId'>, id: number, at: Date | null): void {
    this.repo.update(scope.shopId, id, { smsOptOutAt: at });
  }

  private country(shopId: number): string {
    return this.shops.settings(shopId).country;
  }

  /** Every customer of the shop with contact fields, oldest first (import matching, CSV export). */
  contacts(actor: Pick<AuthUser, 'shopId'>): Array<{ id: number; name: string; email: string | null; phone: string | null; notes: string | null }> {
    return this.repo.contacts(actor.shopId).map((c) => ({ id: c.id, name: c.name, email: c.email || null, phone: c.phone || null, notes: c.notes || null }));
  }

  /** Customers by id, keyed by id; ids of other shops are simply absent. */
  byIds(actor: Pick<AuthUser, 'shopId'>, ids: number[]): Map<number, CustomerDto> {
    return new Map(this.repo.findMany(actor.shopId, [...new Set(ids)]).map((c) => [c.id, toCustomerDto(c)]));
  }
}
