import type { DbTx } from '../db';

/**
 * Domain events, published through @nestjs/event-emitter (EventEmitter2). All are emitted
 * inside the transaction of the change, with that transaction in `tx`, so a listener that
 * enqueues a task (TASK_RUNNER.enqueue(spec, event.tx)) commits or rolls back with the change
 * (transactional outbox). Listeners subscribed with `events.on(NAME, fn)` run synchronously
 * and a throw rolls the change back; `@OnEvent` listeners run later and may not throw into it.
 */
export const DOMAIN_EVENTS = {
  jobBookedIn: 'job.booked_in',
  jobMoved: 'job.moved',
  recommendationDecided: 'recommendation.decided',
  consentChanged: 'consent.changed',
  ownerLinkChanged: 'owner_link.changed',
  ownerPageViewed: 'owner_page.viewed',
} as const;

export type DomainEventName = (typeof DOMAIN_EVENTS)[keyof typeof DOMAIN_EVENTS];

interface InTransaction {
  readonly tx: DbTx;
}

/** A bike was booked in and its job created (same transaction: lay out rows that belong to it). */
export class JobBookedInEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.jobBookedIn;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly jobId: number,
    readonly userId: number,
  ) {}
}

/** A job changed status (JOB_TRANSITIONS in libs/domain). */
export class JobMovedEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.jobMoved;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly jobId: number,
    readonly from: string,
    readonly to: string,
    /** null when the owner moved it through their link. */
    readonly userId: number | null,
  ) {}
}

/** The owner approved or declined recommended work (staff-recorded or from the owner page). */
export class RecommendationDecidedEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.recommendationDecided;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly jobId: number,
    readonly recommendationId: number,
    readonly status: 'pending' | 'approved' | 'declined',
    readonly channel: string,
  ) {}
}

/** The owner gave or withdrew marketing consent (e.g. for the showcase); emitted by the consent feature. */
export class ConsentChangedEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.consentChanged;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly customerId: number,
    readonly jobId: number | null,
    readonly granted: boolean,
  ) {}
}

/** Desk made a new owner link for the job (earlier ones stop working) or revoked one. */
export class OwnerLinkChangedEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.ownerLinkChanged;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly jobId: number,
    readonly linkId: number,
    readonly change: 'created' | 'revoked',
    readonly at: Date,
  ) {}
}

/** The owner opened their page through the job's link (kept on the link as last viewed). */
export class OwnerPageViewedEvent implements InTransaction {
  readonly eventName = DOMAIN_EVENTS.ownerPageViewed;
  constructor(
    readonly tx: DbTx,
    readonly shopId: number,
    readonly jobId: number,
    readonly linkId: number,
    readonly at: Date,
  ) {}
}

export type DomainEvent = JobBookedInEvent | JobMovedEvent | RecommendationDecidedEvent | ConsentChangedEvent | OwnerLinkChangedEvent | OwnerPageViewedEvent;

/** Emits an event under its own name (keeps name and class together at every call site). */
export function publish(emitter: { emit(name: string, ...args: unknown[]): boolean }, event: DomainEvent): void {
  emitter.emit(event.eventName, event);
}
