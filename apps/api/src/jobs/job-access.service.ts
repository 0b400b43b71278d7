import { Inject, Injectable } from '@nestjs/common';
import type Database from 'better-sqlite3';
import { actorCan, type Actor } from '@benchproof/contracts';
import { isTerminalStatus } from '@benchproof/domain';
import { AuditService } from '../audit';
import { type AuthUser, staffActor } from '../core/auth';
import { type DbTx, SQLITE } from '../core/db';
import { DomainError, notFound } from '../core/http';
import { type JobRow, JobsRepository } from './jobs.repository';

/** What other features get from JobAccess: enough to scope and label their own rows. */
export interface JobRef {
  id: number;
  shopId: number;
  number: string;
  status: JobRow['status'];
  bikeId: number;
  customerId: number;
  mechanicId: number | null;
}

/** A staff user as the session guard hands it over, or an actor from the policy guard / owner-link guard. */
export type JobCaller = AuthUser | Actor;

/** Work done for one shop without a person behind it (renders, e-mails, tasks): any job of that shop. */
export interface ShopScope {
  shopId: number;
}

/** The record a change touches, named in JOB_CLOSED details and in the override's audit entry. */
export type EvidenceKind = 'job' | 'media' | 'inspection' | 'finding' | 'recommendation' | 'decision' | 'work_log';

export const toJobRef = (j: JobRow): JobRef => ({
  id: j.id,
  shopId: j.shopId,
  number: j.number,
  status: j.status,
  bikeId: j.bikeId,
  customerId: j.customerId,
  mechanicId: j.mechanicId,
});

const asActor = (c: JobCaller): Actor => ('kind' in c ? c : staffActor(c));

/**
 * The per-object checks every feature runs before touching a job's records:
 * the job is in the caller's shop (an owner link: it is the link's job), else
 * NOT_FOUND so other shops learn nothing; and for changes, the job is still
 * open. Evidence freezes at handover (collected, or cancelled): a change is
 * JOB_CLOSED unless the caller may `jobs.reopen_evidence` (managers), and every
 * such override is written to the audit log inside the change's own unit of work,
 * so the change and its override record commit together or not at all.
 */
@Injectable()
export class JobAccess {
  constructor(
    private readonly repo: JobsRepository,
    private readonly audit: AuditService,
    @Inject(SQLITE) private readonly opened: { sqlite: Database.Database },
  ) {}

  /** The job if the caller may see it, else NOT_FOUND. */
  read(caller: JobCaller | ShopScope, jobId: number): JobRef {
    const owner = 'kind' in caller && caller.kind === 'owner' ? caller : null;
    const job = owner && owner.jobId !== jobId ? undefined : this.repo.find(caller.shopId, jobId);
    if (!job) throw notFound('Job');
    return toJobRef(job);
  }

  /**
   * Before slow work that precedes the change (an upload's bytes): the answer `change` would give, writing nothing.
   * The change itself still calls `change` inside its unit of work.
   */
  check(caller: JobCaller, jobId: number, what: EvidenceKind): JobRef {
    const job = this.read(caller, jobId);
    if (isTerminalStatus(job.status) && !this.mayOverride(caller)) throw new DomainError('JOB_CLOSED', undefined, { status: job.status, what });
    return job;
  }

  /**
   * The job if the caller may change its `what` records now: open, or closed with a manager override whose audit
   * record is written in the caller's transaction (`tx`, from `uow.run`), so a change that fails leaves no record.
   */
  change(caller: JobCaller, jobId: number, what: EvidenceKind, _tx: DbTx): JobRef {
    if (!this.opened.sqlite.inTransaction) throw new Error('JobAccess.change runs inside the unit of work of the change it allows');
    const job = this.check(caller, jobId, what);
    if (!isTerminalStatus(job.status)) return job;
    const actor = asActor(caller);
    if (actor.kind === 'staff')
      this.audit.record(
        { id: actor.userId, shopId: actor.shopId },
        { action: 'job.closed_override', entityType: 'job', entityId: jobId, details: { status: job.status, what } },
      );
    return job;
  }

  private mayOverride(caller: JobCaller): boolean {
    const actor = asActor(caller);
    return actor.kind === 'staff' && actorCan(actor, 'jobs.reopen_evidence');
  }
}
