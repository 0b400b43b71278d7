import { Injectable } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { DOMAIN_EVENTS, type JobMovedEvent } from '../core/events';
import { JobAccess } from '../jobs';
import { TextsService } from './texts.service';

/**
 * "Ready to collect" by text for owners who prefer texts: queued in the transaction that moves the
 * job to ready (a synchronous listener, so the text and the move commit together or not at all).
 */
@Injectable()
export class ReadyTextListener {
  constructor(
    events: EventEmitter2,
    private readonly texts: TextsService,
    private readonly access: JobAccess,
  ) {
    events.on(DOMAIN_EVENTS.jobMoved, (e: JobMovedEvent) => this.moved(e));
  }

  private moved(e: JobMovedEvent): void {
    if (e.to !== 'ready') return;
    const scope = { shopId: e.shopId };
    const job = this.access.read(scope, e.jobId);
    if (!this.texts.prefersTexts(scope, job.customerId)) return;
    this.texts.queue(scope, { jobId: e.jobId, customerId: job.customerId, kind: 'ready_to_collect', link: null }, e.tx);
  }
}
