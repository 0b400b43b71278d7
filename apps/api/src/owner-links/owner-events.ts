import { Inject, Injectable } from '@nestjs/common';
import type { OwnerEvent } from '@benchproof/contracts';
import { map, type Observable } from 'rxjs';
import { LIVE_UPDATES, type LiveUpdates } from '../infra/live';

/**
 * What the owner does (views, decisions, consent) and link changes, told to staff job pages
 * (Server-Sent Events) through the one live-updates port: in this process by default, Redis
 * pub/sub when several API processes serve (REDIS_URL), so a decision taken through one process
 * reaches a job page held open by another. One topic per job of a shop.
 */
@Injectable()
export class OwnerLiveEvents {
  constructor(@Inject(LIVE_UPDATES) private readonly live: LiveUpdates) {}

  emit(shopId: number, event: OwnerEvent): void {
    this.live.publish(topic(shopId, event.jobId), event);
  }

  /** Events of one job of one shop, as SSE messages. */
  forJob(shopId: number, jobId: number): Observable<{ type: string; data: OwnerEvent }> {
    return this.live.subscribe<OwnerEvent>(topic(shopId, jobId)).pipe(map((data) => ({ type: 'owner', data })));
  }
}

const topic = (shopId: number, jobId: number): string => `owner:${shopId}:${jobId}`;
