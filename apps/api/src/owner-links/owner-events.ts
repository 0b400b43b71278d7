import { Injectable } from '@nestjs/common';
import type { OwnerEvent } from '@benchproof/contracts';
import { filter, map, type Observable, Subject } from 'rxjs';

/**
 * In-process fan-out of owner activity to staff job pages (Server-Sent Events).
 * One server process today; several servers would need a shared channel.
 */
@Injectable()
export class OwnerEventsBus {
  private readonly events = new Subject<{ shopId: number; event: OwnerEvent }>();

  emit(shopId: number, event: OwnerEvent): void {
    this.events.next({ shopId, event });
  }

  /** Events of one job of one shop, as SSE messages. */
  forJob(shopId: number, jobId: number): Observable<{ type: string; data: OwnerEvent }> {
    return this.events.pipe(
      filter((e) => e.shopId === shopId && e.event.jobId === jobId),
      map((e) => ({ type: 'owner', data: e.event })),
    );
  }
}
