import { Inject, Injectable } from '@nestjs/common';
import type { CustomerInput, CustomerDto, CustomerListQuery, CustomerPage, UpdateCustomerRequest } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { type CustomerRow, CustomersRepository } from './customers.repository';

export const toCustomerDto = (c: CustomerRow): CustomerDto => ({
  id: c.id,
  name: c.name,
  email: c.email || null,
  phone: c.phone || null,
  preferredChannel: c.preferredChannel,
  notes: c.notes || null,
  createdAt: c.createdAt.toISOString(),
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

  create(actor: Pick<AuthUser, 'shopId'>, input: CustomerInput): CustomerDto {
    const now = this.clock.now();
    const row = this.repo.insert({ ...toColumns(input), shopId: actor.shopId, createdAt: now, updatedAt: now });
    return toCustomerDto(row);
  }

  update(actor: AuthUser, id: number, patch: UpdateCustomerRequest): CustomerDto {
    const row = this.repo.update(actor.shopId, id, { ...toColumns(patch), updatedAt: this.clock.now() });
    if (!row) throw notFound('Customer');
    return toCustomerDto(row);
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
