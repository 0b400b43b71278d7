import { Inject, Injectable } from '@nestjs/common';
import type {
  BookInRequest,
  FinalCheckDto,
  FinalCheckRequest,
  JobDetail,
  JobDto,
  JobEvent,
  JobListQuery,
  JobPage,
  TransitionRequest,
  UpdateJobRequest,
} from '@benchproof/contracts';
import { canTransition, finalCheckAllowed, allowedNextStatuses } from '@benchproof/domain';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { JobMovedEvent, publish } from '../core/events';
import { DomainError, notFound } from '../core/http';
import { CustomersService } from '../customers';
import { CLOCK, type Clock } from '../core/clock';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import { BookInService } from './book-in.service';
import { JobAccess, type JobRef, toJobRef } from './job-access.service';
import { type JobRow, JobsRepository } from './jobs.repository';
import { JobBalances } from './job-balances';
import { STATUS_TIME_FIELD, toDetail, toFinalCheckDto, toJobDto, toJobListDto, type SummaryContext } from './jobs.view';
import { UnitOfWork } from '../core/db';

type Actor = Pick<AuthUser, 'shopId'>;

@Injectable()
export class JobsService {
  constructor(
    private readonly repo: JobsRepository,
    private readonly uow: UnitOfWork,
    private readonly customers: CustomersService,
    private readonly bikes: BikesService,
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    private readonly access: JobAccess,
    private readonly booking: BookInService,
    private readonly balances: JobBalances,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly emitter: EventEmitter2,
  ) {}

  private today(): string {
    return this.clock.now().toISOString().slice(0, 10);
  }

  private context(actor: AuthUser, rows: JobRow[]): SummaryContext {
    return {
      owners: this.customers.byIds(
        actor,
        rows.map((r) => r.customerId),
      ),
      bikes: this.bikes.byIds(
        actor,
        rows.map((r) => r.bikeId),
      ),
      staff: new Map(this.users.list(actor).map((u) => [u.id, u.name])),
      today: this.today(),
    };
  }

  private load(actor: Pick<AuthUser, 'shopId'>, id: number): JobRow {
    const job = this.repo.find(actor.shopId, id);
    if (!job) throw notFound('Job');
    return job;
  }

  list(actor: AuthUser, query: JobListQuery): JobPage {
    const today = this.today();
    const readyUnpaidIds = query.readyUnpaid ? this.balances.readyUnpaidIds(actor.shopId) : undefined;
    const { rows, total } = this.repo.page(actor.shopId, { query, today, readyUnpaidIds });
    const due = this.balances.dueByJob(
      actor.shopId,
      rows.map((r) => r.id),
    );
    const items = rows.map((r) => toJobListDto(r, today, due.get(r.id) ?? null));
    return { items, total, page: query.page, pageSize: query.pageSize };
  }

  /** Every visit of one bike, oldest first. */
  listForBike(actor: AuthUser, bikeId: number): JobDto[] {
    const rows = this.repo.listByBike(actor.shopId, bikeId);
    const ctx = this.context(actor, rows);
    return rows.map((r) => toJobDto(r, ctx));
  }

  get(actor: AuthUser, id: number): JobDetail {
    const job = this.load(actor, id);
    const settings = this.shops.settings(actor.shopId);
    return toDetail(job, this.context(actor, [job]), {
      finalCheck: this.repo.latestFinalCheck(actor.shopId, id),
      finalCheckSecondPerson: settings.finalCheckSecondPerson,
    });
  }

  private checkStaff(actor: AuthUser, userId: number | null | undefined): void {
    if (userId) this.users.get(actor, userId);
  }

  /** Desk books a bike in: customer and bike found or created, number issued, checklist laid out — all or nothing. */
  bookIn(actor: AuthUser, input: BookInRequest): JobDetail {
    this.checkStaff(actor, input.mechanicId);
    return this.get(actor, this.booking.bookIn(actor, input));
  }

  update(actor: AuthUser, id: number, patch: UpdateJobRequest): JobDetail {
    return this.uow.run((tx) => {
      this.access.change(actor, id, 'job', tx);
      this.checkStaff(actor, patch.mechanicId);
      this.uow.run(() => {
        this.repo.update(actor.shopId, id, { ...patch, updatedAt: this.clock.now() });
        this.audit.record(actor, { action: 'job.updated', entityType: 'job', entityId: id, details: { fields: Object.keys(patch) } });
      });
      return this.get(actor, id);
    });
  }

  /** Moves the job along JOB_TRANSITIONS (libs/domain); anything else is ILLEGAL_TRANSITION. */
  transition(actor: AuthUser, id: number, input: TransitionRequest): JobDetail {
    this.move(actor, id, input.to, input.note ?? '', { confirmNoReport: input.confirmNoReport, unpaidReason: input.unpaidReason });
    return this.get(actor, id);
  }

  /** What the owner page may show of a job: no staff, no internal notes. */
  ownerFacing(scope: Pick<AuthUser, 'shopId'>, id: number): JobRef & { reportedSymptoms: string; promisedOn: string | null } {
    const job = this.load(scope, id);
    return { ...toJobRef(job), reportedSymptoms: job.reportedSymptoms, promisedOn: job.promisedOn };
  }

  /** The mail feature records whether a report e-mail is sent or on its way (the hand-over rule reads it). */
  recordReportSent(scope: Actor, id: number, sent: boolean): void {
    this.repo.update(scope.shopId, id, { reportSent: sent });
  }

  /** A status change caused by the owner on their own page: same table, no staff user, audited as the owner link. */
  transitionByOwner(scope: Pick<AuthUser, 'shopId'>, id: number, to: JobRow['status'], note: string): void {
    this.move({ shopId: scope.shopId, id: null }, id, to, note);
  }

  private move(
    actor: { shopId: number; id: number | null },
    id: number,
    to: JobRow['status'],
    note: string,
    confirm: { confirmNoReport?: boolean; unpaidReason?: string | null } = {},
  ): void {
    this.uow.run((tx) => {
      const job = this.load(actor, id);
      if (!canTransition(job.status, to))
        throw new DomainError('ILLEGAL_TRANSITION', undefined, { from: job.status, to, allowed: allowedNextStatuses(job.status) });
      if (to === 'ready') this.requirePassedCheck(actor, job);
      // Collected is terminal, so only the hand-over ever sets collectedWithoutReport.
      const withoutReport = to === 'collected' && !job.reportSent;
      if (withoutReport && !confirm.confirmNoReport) throw new DomainError('REPORT_NOT_SENT');
      const unpaid = to === 'collected' ? this.unpaidHandover(actor.shopId, id, confirm.unpaidReason) : null;
      const now = this.clock.now();
      this.repo.update(actor.shopId, id, { status: to, [STATUS_TIME_FIELD[to]]: now, updatedAt: now, collectedWithoutReport: withoutReport });
      this.repo.insertEvent({
        shopId: actor.shopId,
        jobId: id,
        fromStatus: job.status,
        toStatus: to,
        userId: actor.id,
        note: [note || (withoutReport ? 'Handed over without a report' : ''), unpaid?.note ?? ''].filter(Boolean).join(' · '),
        at: now,
      });
      const details = {
        ...{ from: job.status, to, ...(actor.id === null ? { by: 'owner_link' } : {}), ...(withoutReport ? { withoutReport } : {}) },
        ...(unpaid ? { unpaidMinor: unpaid.dueMinor, unpaidReason: unpaid.reason } : {}),
      };
      this.audit.record(actor, { action: 'job.status_changed', entityType: 'job', entityId: id, details });
      publish(this.emitter, new JobMovedEvent(tx, actor.shopId, id, job.status, to, actor.id));
    });
  }

  /** A hand-over with money due: desk's reason is required and goes into the status history and audit. */
  private unpaidHandover(shopId: number, id: number, reason: string | null | undefined): { dueMinor: number; reason: string; note: string } | null {
    const dueMinor = this.balances.requireSettled(shopId, id, reason);
    if (dueMinor <= 0 || !reason) return null;
    return { dueMinor, reason, note: `Went home unpaid: ${reason}` };
  }

  /** Ready needs a passed final check taken since the job last entered final check. */
  private requirePassedCheck(actor: Actor, job: JobRow): void {
    const check = this.repo.latestFinalCheck(actor.shopId, job.id);
    const since = job.finalCheckAt?.getTime() ?? 0;
    if (!check || !check.passed || check.at.getTime() < since) throw new DomainError('FINAL_CHECK_REQUIRED');
  }

  events(actor: AuthUser, id: number): JobEvent[] {
    this.load(actor, id);
    const staff = new Map(this.users.list(actor).map((u) => [u.id, u.name]));
    return this.repo.events(actor.shopId, id).map((e) => ({
      id: e.id,
      from: e.fromStatus,
      to: e.toStatus,
      user: e.userId ? { id: e.userId, name: staff.get(e.userId) ?? '' } : null,
      note: e.note || null,
      at: e.at.toISOString(),
    }));
  }

  /** Records the final check; with the shop's second-person rule on, the job's mechanic may not sign it. */
  recordFinalCheck(actor: AuthUser, id: number, input: FinalCheckRequest): FinalCheckDto {
    const job = this.load(actor, id);
    if (job.status !== 'final_check') throw new DomainError('CONFLICT', 'The job is not waiting for its final check.', { status: job.status });
    const { finalCheckSecondPerson } = this.shops.settings(actor.shopId);
    if (!finalCheckAllowed({ requiresSecondPerson: finalCheckSecondPerson, mechanicId: job.mechanicId, checkerId: actor.id })) {
      throw new DomainError('FINAL_CHECK_SAME_PERSON');
    }
    const now = this.clock.now();
    const row = this.uow.run(() => {
      const check = this.repo.insertFinalCheck({
        shopId: actor.shopId,
        jobId: id,
        checkerId: actor.id,
        passed: input.passed,
        items: input.items,
        testRideNotes: input.testRideNotes,
        notes: input.note ?? '',
        at: now,
      });
      this.repo.update(actor.shopId, id, { finalCheckerId: input.passed ? actor.id : job.finalCheckerId, updatedAt: now });
      this.audit.record(actor, { action: 'job.final_check', entityType: 'job', entityId: id, details: { passed: input.passed } });
      return check;
    });
    return toFinalCheckDto(row, new Map([[actor.id, actor.name]]));
  }
}
