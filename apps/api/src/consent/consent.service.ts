import { Inject, Injectable } from '@nestjs/common';
import { CONSENT_WORDING, type ConsentDto, type ConsentStatusDto, type OwnerConsentRequest, type RecordConsentRequest } from '@benchproof/contracts';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { ConsentChangedEvent, publish } from '../core/events';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { JobAccess, type JobCaller } from '../jobs';
import { type ConsentRow, ConsentRepository } from './consent.repository';
import { UnitOfWork } from '../core/db';

const toDto = (r: ConsentRow): ConsentDto => ({
  id: r.id,
  jobId: r.jobId,
  granted: r.granted,
  nameMakeModel: r.nameMakeModel,
  wordingVersion: r.wordingVersion,
  method: r.method,
  givenByName: r.givenByName,
  recordedById: r.recordedBy,
  at: r.at.toISOString(),
});

/** How a consent change reached us: the owner's own page, or staff recording what the owner said in person. */
export type ConsentSource =
  { method: 'owner_link'; ownerLinkId: number; givenByName: string } | { method: 'in_person'; recordedBy: Pick<AuthUser, 'id' | 'shopId'> };

/**
 * The owner's marketing consent per job. The showcase asks `currentConsent`
 * before using any pair; a revocation is simply a newer row with granted=false.
 */
@Injectable()
export class ConsentService {
  constructor(
    private readonly repo: ConsentRepository,
    private readonly uow: UnitOfWork,
    private readonly access: JobAccess,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly emitter: EventEmitter2,
  ) {}

  /** The consent in force for this job, or null when the owner was never asked or never answered. */
  currentConsent(shopId: number, jobId: number): ConsentDto | null {
    const [latest] = this.repo.history(shopId, jobId);
    return latest ? toDto(latest) : null;
  }

  /** The consents in force that are grants, one per job (the showcase's candidate jobs). */
  currentGrants(shopId: number): ConsentDto[] {
    const seen = new Set<number>();
    const current = this.repo.allNewestFirst(shopId).filter((r) => !seen.has(r.jobId) && seen.add(r.jobId));
    return current.filter((r) => r.granted).map(toDto);
  }

  status(actor: JobCaller, jobId: number): ConsentStatusDto {
    this.access.read(actor, jobId);
    const history = this.repo.history(actor.shopId, jobId).map(toDto);
    return { current: history[0] ?? null, history, wordingVersion: CONSENT_WORDING.version };
  }

  /** Staff record a consent given or withdrawn in person. */
  recordInPerson(actor: AuthUser, jobId: number, input: RecordConsentRequest): ConsentDto {
    return this.record(actor, jobId, input, { method: 'in_person', recordedBy: actor });
  }

  /**
   * The one way a consent change is stored (owner page and staff alike). ConsentChangedEvent
   * goes out inside the same transaction, so what listeners write (the showcase drops a
   * withdrawn job's marks) commits or rolls back with the consent row.
   */
  record(scope: JobCaller, jobId: number, input: OwnerConsentRequest, source: ConsentSource): ConsentDto {
    const job = this.access.read(scope, jobId);
    if (input.wordingVersion !== CONSENT_WORDING.version) {
      throw new DomainError('CONSENT_WORDING_CHANGED', undefined, { current: CONSENT_WORDING.version });
    }
    return this.uow.run((tx) => {
      const row = this.insert(scope.shopId, jobId, input, source);
      const who = source.method === 'in_person' ? source.recordedBy : { shopId: scope.shopId, id: null };
      this.audit.record(who, {
        action: input.granted ? 'consent.granted' : 'consent.revoked',
        entityType: 'job',
        entityId: jobId,
        details: { method: source.method, nameMakeModel: row.nameMakeModel, wordingVersion: row.wordingVersion, givenByName: row.givenByName },
      });
      publish(this.emitter, new ConsentChangedEvent(tx, scope.shopId, job.customerId, jobId, row.granted));
      return toDto(row);
    });
  }

  private insert(shopId: number, jobId: number, input: OwnerConsentRequest, source: ConsentSource): ConsentRow {
    const fromStaff = source.method === 'in_person';
    return this.repo.insert({
      shopId,
      jobId,
      granted: input.granted,
      // kept on a withdrawal too, so granting again keeps the owner's choice; nothing is shown without a grant
      nameMakeModel: input.nameMakeModel,
      wordingVersion: input.wordingVersion,
      method: source.method,
      givenByName: fromStaff ? (input as RecordConsentRequest).givenByName : source.givenByName,
      recordedBy: fromStaff ? source.recordedBy.id : null,
      ownerLinkId: fromStaff ? null : source.ownerLinkId,
      at: this.clock.now(),
    });
  }
}
