import { Inject, Injectable } from '@nestjs/common';
import type { BikeListItem, BookInRequest, CustomerDto } from '@benchproof/contracts';
import { formatJobNumber } from '@benchproof/domain';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { JobBookedInEvent, publish } from '../core/events';
import { DomainError } from '../core/http';
import { CustomersService } from '../customers';
import { CLOCK, type Clock } from '../core/clock';
import { ShopsService } from '../shops';
import { JobsRepository } from './jobs.repository';
import { UnitOfWork } from '../core/db';

/** Book-in: customer and bike found or created, number issued, first event written — all or nothing. Reached through JobsService.bookIn. */
@Injectable()
export class BookInService {
  constructor(
    private readonly repo: JobsRepository,
    private readonly uow: UnitOfWork,
    private readonly customers: CustomersService,
    private readonly bikes: BikesService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly emitter: EventEmitter2,
  ) {}

  /** Returns the new job's id. */
  bookIn(actor: AuthUser, input: BookInRequest): number {
    return this.uow.run((tx) => {
      const customer = this.resolveCustomer(actor, input);
      const bike = this.resolveBike(actor, customer, input);
      const now = this.clock.now();
      const number = formatJobNumber(now.getUTCFullYear(), this.shops.takeJobSeq(actor.shopId));
      const row = this.repo.insert({
        shopId: actor.shopId,
        number,
        bikeId: bike.id,
        customerId: customer.id,
        status: 'booked_in',
        reportedSymptoms: input.reportedSymptoms,
        promisedOn: input.promisedOn,
        mechanicId: input.mechanicId ?? null,
        createdBy: actor.id,
        bookedInAt: now,
        createdAt: now,
        updatedAt: now,
      });
      this.repo.insertEvent({ shopId: actor.shopId, jobId: row.id, fromStatus: null, toStatus: 'booked_in', userId: actor.id, note: '', at: now });
      publish(this.emitter, new JobBookedInEvent(tx, actor.shopId, row.id, actor.id));
      this.audit.record(actor, { action: 'job.booked_in', entityType: 'job', entityId: row.id, details: { number } });
      return row.id;
    });
  }

  private resolveCustomer(actor: AuthUser, input: BookInRequest): CustomerDto {
    if (input.newCustomer) return this.customers.create(actor, input.newCustomer);
    return this.customers.get(actor, input.customerId ?? 0);
  }

  private resolveBike(actor: AuthUser, owner: CustomerDto, input: BookInRequest): BikeListItem {
    if (input.newBike) return this.bikes.insert(actor, owner.id, input.newBike);
    const bike = this.bikes.get(actor, input.bikeId ?? 0);
    if (bike.customerId !== owner.id) {
      throw new DomainError('VALIDATION_FAILED', 'bikeId: that bike belongs to another customer.', {
        issues: [{ path: 'bikeId', message: 'Belongs to another customer' }],
      });
    }
    return bike;
  }
}
