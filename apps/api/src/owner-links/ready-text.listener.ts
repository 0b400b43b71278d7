import { Injectable } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { DOMAIN_EVENTS, type JobMovedEvent } from '../core/events';
import { JobAccess } from '../jobs';
import { TextsService } from '../texts';
import { OwnerLinksService } from './owner-links.service';

/**
 * "Ready to collect" by text for owners who prefer texts: queued in the transaction that moves the
 * job to ready (a synchronous listener, so the text and the move commit together or not at all), with
 * a fresh owner link when the job had a live one (OwnerLinksService.renewForText). Here rather than in
 * texts because texts must not reach owner links (owner links send through texts).
 */
@Injectable()
export class ReadyTextListener {
  constructor(
    events: EventEmitter2,
    private readonly texts: TextsService,
    private readonly links: OwnerLinksService,
    private readonly access: JobAccess,
  ) {
    events.on(DOMAIN_EVENTS.jobMoved, (e: JobMovedEvent) => this.moved(e));
  }

  private moved(e: JobMovedEvent): void {
    if (e.to !== 'ready') return;
    const scope = { shopId: e.shopId };
    const job = this.access.read(scope, e.jobId);
    if (!this.texts.prefersTexts(scope, job.customerId)) return;
    const number = this.texts.numberFor(scope, job.customerId);
    if (!number) return;
    const link = e.userId === null ? null : this.links.renewForText({ shopId: e.shopId, id: e.userId }, e.jobId, number, e.tx);
    this.texts.queue(scope, { jobId: e.jobId, customerId: job.customerId, kind: 'ready_to_collect', link }, e.tx);
  }
}
