import { Inject, Injectable } from '@nestjs/common';
import type { BikeInput, BikeListItem, BikeListQuery, BikePage, NewBikeInput, UpdateBikeRequest } from '@benchproof/contracts';
import type { AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { CustomersService } from '../customers';
import { CLOCK, type Clock } from '../core/clock';
import { type BikeRow, BikesRepository } from './bikes.repository';

const toDto = (b: BikeRow, ownerName: string): BikeListItem => ({
  id: b.id,
  customerId: b.customerId,
  ownerName,
  maker: b.maker,
  model: b.model,
  year: b.year,
  frameMaterial: b.frameMaterial,
  size: b.size || null,
  colour: b.colour || null,
  serialNumber: b.serialNumber || null,
  drivetrainSpeeds: b.drivetrainSpeeds,
  brakeType: b.brakeType,
  cableRouting: b.cableRouting,
  dropoutType: b.dropoutType,
  tyreSize: b.tyreSize,
  createdAt: b.createdAt.toISOString(),
});

/** Contract nulls are stored as '' so the columns stay simple to search. */
const toColumns = (spec: NewBikeInput) => ({
  ...spec,
  size: spec.size ?? '',
  colour: spec.colour ?? '',
  serialNumber: spec.serialNumber ?? '',
});

/** Bikes of the caller's shop; each belongs to one customer of the same shop. */
@Injectable()
export class BikesService {
  constructor(
    private readonly repo: BikesRepository,
    private readonly customers: CustomersService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  private withOwners(actor: Pick<AuthUser, 'shopId'>, rows: BikeRow[]): BikeListItem[] {
    const owners = this.customers.byIds(
      actor,
      rows.map((r) => r.customerId),
    );
    return rows.map((r) => toDto(r, owners.get(r.customerId)?.name ?? ''));
  }

  list(actor: AuthUser, query: BikeListQuery): BikePage {
    const { rows, total } = this.repo.page(actor.shopId, query);
    return { items: this.withOwners(actor, rows), total, page: query.page, pageSize: query.pageSize };
  }

  listForCustomer(actor: AuthUser, customerId: number): BikeListItem[] {
    this.customers.get(actor, customerId);
    return this.withOwners(actor, this.repo.listByCustomer(actor.shopId, customerId));
  }

  get(actor: Pick<AuthUser, 'shopId'>, id: number): BikeListItem {
    const row = this.repo.find(actor.shopId, id);
    if (!row) throw notFound('Bike');
    return this.withOwners(actor, [row])[0];
  }

  create(actor: Pick<AuthUser, 'shopId'>, input: BikeInput): BikeListItem {
    const { customerId, ...spec } = input;
    this.customers.get(actor, customerId);
    return this.insert(actor, customerId, spec);
  }

  /** Adds a bike for an owner already checked to be in the caller's shop (book-in). */
  insert(actor: Pick<AuthUser, 'shopId'>, customerId: number, spec: NewBikeInput): BikeListItem {
    const now = this.clock.now();
    const row = this.repo.insert({ ...toColumns(spec), customerId, shopId: actor.shopId, createdAt: now, updatedAt: now });
    return this.withOwners(actor, [row])[0];
  }

  update(actor: AuthUser, id: number, patch: UpdateBikeRequest): BikeListItem {
    const { customerId, ...spec } = patch;
    this.customers.get(actor, customerId);
    const row = this.repo.update(actor.shopId, id, { ...toColumns(spec), customerId, updatedAt: this.clock.now() });
    if (!row) throw notFound('Bike');
    return this.withOwners(actor, [row])[0];
  }

  byIds(actor: Pick<AuthUser, 'shopId'>, ids: number[]): Map<number, BikeListItem> {
    const rows = this.repo.findMany(actor.shopId, [...new Set(ids)]);
    return new Map(this.withOwners(actor, rows).map((b) => [b.id, b]));
  }
}
