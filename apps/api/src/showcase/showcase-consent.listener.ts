import { Injectable, Logger } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { DOMAIN_EVENTS, type ConsentChangedEvent } from '../core/events';
import { ShowcaseExportTasks } from './showcase-export-tasks.service';
import { ShowcaseService } from './showcase.service';

/**
 * The showcase's answer to a consent change (the consent feature never calls the showcase).
 * Listings and exports read consent afresh anyway; on a withdrawal this also drops the job's
 * marks in the same transaction and stops running exports that draw on the job.
 */
@Injectable()
export class ShowcaseConsentListener {
  private readonly logger = new Logger('ShowcaseConsent');

  constructor(
    events: EventEmitter2,
    private readonly showcase: ShowcaseService,
    private readonly exports: ShowcaseExportTasks,
  ) {
    // Synchronous (events.on, not @OnEvent): the marks go or stay with the consent row.
    events.on(DOMAIN_EVENTS.consentChanged, (e: ConsentChangedEvent) => this.changed(e));
  }

  private changed(e: ConsentChangedEvent): void {
    const { shopId, jobId } = e;
    if (e.granted || jobId === null) return;
    this.showcase.forgetJob(e.tx, shopId, jobId);
    // Stopping exports and deleting zips is not transactional: done once the change has
    // committed. cancelFor reads the consent again, so a rolled-back revocation stops nothing.
    setImmediate(() => void this.exports.cancelFor(shopId, jobId).catch((err: unknown) => this.logger.error(err)));
  }
}
