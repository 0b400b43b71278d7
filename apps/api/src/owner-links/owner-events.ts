import { Inject, Injectable } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import type { OwnerEvent } from '@benchproof/contracts';
import { map, type Observable } from 'rxjs';
import { CLOCK, type Clock } from '../core/clock';
import { UnitOfWork } from '../core/db';
import {
  type ConsentChangedEvent,
  DOMAIN_EVENTS,
  type OwnerLinkChangedEvent,
  type OwnerPageViewedEvent,
  type RecommendationDecidedEvent,
} from '../core/events';
import { LIVE_UPDATES, type LiveUpdates } from '../infra/live';

/**
 * Staff job pages (Server-Sent Events) hear about what the owner does and about link changes from the
 * domain events, the one way features announce changes: a decision (RecommendationDecidedEvent), a consent
 * (ConsentChangedEvent), a link made or revoked (OwnerLinkChangedEvent), a page view (OwnerPageViewedEvent).
 * Each event is told once its transaction has committed (UnitOfWork.afterCommit; a rolled-back change tells
 * nothing), one message per job and kind per transaction, through the one live-updates port: in this process
 * by default, Redis pub/sub when several API processes serve (REDIS_URL), so a decision taken through one
 * process reaches a job page held open by another. One topic per job of a shop.
 */
@Injectable()
export class OwnerLiveEvents {
  constructor(
    events: EventEmitter2,
    private readonly uow: UnitOfWork,
    @Inject(LIVE_UPDATES) private readonly live: LiveUpdates,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {
    events.on(DOMAIN_EVENTS.recommendationDecided, (e: RecommendationDecidedEvent) => this.tell(e.shopId, 'decided', e.jobId));
    events.on(DOMAIN_EVENTS.consentChanged, (e: ConsentChangedEvent) => e.jobId !== null && this.tell(e.shopId, 'consent', e.jobId));
    events.on(DOMAIN_EVENTS.ownerLinkChanged, (e: OwnerLinkChangedEvent) => this.tell(e.shopId, 'link', e.jobId, e.at));
    events.on(DOMAIN_EVENTS.ownerPageViewed, (e: OwnerPageViewedEvent) => this.tell(e.shopId, 'viewed', e.jobId, e.at));
  }

  /** Events of one job of one shop, as SSE messages. */
  forJob(shopId: number, jobId: number): Observable<{ type: string; data: OwnerEvent }> {
    return this.live.subscribe<OwnerEvent>(topic(shopId, jobId)).pipe(map((data) => ({ type: 'owner', data })));
  }

  private tell(shopId: number, type: OwnerEvent['type'], jobId: number, at: Date = this.clock.now()): void {
    const event: OwnerEvent = { type, jobId, at: at.toISOString() };
    const where = topic(shopId, jobId);
    this.uow.afterCommit(() => this.live.publish(where, event), `${where}:${type}`);
  }
}

const topic = (shopId: number, jobId: number): string => `owner:${shopId}:${jobId}`;
