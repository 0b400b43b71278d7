import { Inject, Injectable } from '@nestjs/common';
import type { TorqueEntryDto, TorqueEntryRequest, WorkEntryDto, WorkEntryRequest } from '@benchproof/contracts';
import { isDomainInputError, isWrenchCalibrationOverdue, latestCalendarDate, torqueVerdict, type TorqueVerdict } from '@benchproof/domain';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { JobAccess } from '../jobs';
import { ShopsService } from '../shops';
import { UsersService } from '../users';
import type { StoredTorqueInput } from '../db/schema';
import { type TorqueEntryRow, type WorkEntryRow, WorkLogRepository } from './work-log.repository';
import { type DbTx, UnitOfWork } from '../core/db';

const toWorkDto = (w: WorkEntryRow, staff: Map<number, string>): WorkEntryDto => ({
  id: w.id,
  description: w.description,
  partsUsed: w.partsUsed,
  minutes: w.minutes,
  rateMinor: w.rateMinor ?? null,
  userId: w.userId,
  userName: w.userId ? (staff.get(w.userId) ?? null) : null,
  at: w.at.toISOString(),
});

function toTorqueDto(t: TorqueEntryRow, staff: Map<number, string>): TorqueEntryDto {
  const { input, result: v } = t;
  return {
    id: t.id,
    fastener: t.fastener,
    specified: { min: input.specified.min, max: input.specified.max ?? null, unit: input.specified.unit },
    applied: { value: input.applied.value, unit: input.applied.unit },
    tolerancePct: v.tolerancePct,
    specSource: t.specSource,
    tool: t.tool,
    toolCalibratedOn: t.toolCalibratedOn,
    // Judged on the day of the entry, so the log keeps saying what was true when the bolt was torqued.
    calibrationOverdue: isWrenchCalibrationOverdue(t.toolCalibratedOn, t.at.toISOString().slice(0, 10)),
    threadlocker: t.threadlocker,
    carbonPart: t.carbonPart,
    verdict: v.verdict,
    withinTolerance: v.withinTolerance,
    deviationPct: v.deviationPct,
    appliedNm: v.appliedNm,
    lowNm: v.lowNm,
    highNm: v.highNm,
    message: v.message,
    cautions: [...v.cautions],
    userId: t.userId,
    userName: t.userId ? (staff.get(t.userId) ?? null) : null,
    at: t.at.toISOString(),
  };
}

/** What was done on the bench and which fasteners were torqued to what, with verdicts from libs/domain. */
@Injectable()
export class WorkLogService {
  constructor(
    private readonly uow: UnitOfWork,
    private readonly repo: WorkLogRepository,
    private readonly jobs: JobAccess,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly shops: ShopsService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  private staff(actor: AuthUser): Map<number, string> {
    return new Map(this.users.list(actor).map((u) => [u.id, u.name]));
  }

  /** JobAccess's per-object check: in the caller's shop and still open (or a manager's audited override). */
  private openJob(actor: AuthUser, jobId: number, tx: DbTx): void {
    this.jobs.change(actor, jobId, 'work_log', tx);
  }

  listWork(actor: AuthUser, jobId: number): WorkEntryDto[] {
    this.jobs.read(actor, jobId);
    const staff = this.staff(actor);
    return this.repo.workEntries(actor.shopId, jobId).map((w) => toWorkDto(w, staff));
  }

  addWork(actor: AuthUser, jobId: number, input: WorkEntryRequest): WorkEntryDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const { chargeable, ...entry } = input;
      // The rate is copied in, so a later change of the shop's rate does not re-price logged work.
      const rateMinor = chargeable ? this.shops.settings(actor.shopId).labourRateMinor : null;
      const row = this.uow.run(() => this.repo.insertWorkEntry({ ...entry, rateMinor, shopId: actor.shopId, jobId, userId: actor.id, at: this.clock.now() }));
      return toWorkDto(row, this.staff(actor));
    });
  }

  deleteWork(actor: AuthUser, jobId: number, entryId: number): void {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      if (!this.repo.workEntry(actor.shopId, jobId, entryId)) throw notFound('Work entry');
      this.uow.run(() => {
        this.repo.deleteWorkEntry(actor.shopId, entryId);
        this.audit.record(actor, { action: 'work_entry.deleted', entityType: 'job', entityId: jobId, details: { entryId } });
      });
    });
  }

  listTorque(actor: AuthUser, jobId: number): TorqueEntryDto[] {
    this.jobs.read(actor, jobId);
    const staff = this.staff(actor);
    return this.repo.torqueEntries(actor.shopId, jobId).map((t) => toTorqueDto(t, staff));
  }

  /** Stores the reading and the verdict computed by libs/domain torqueVerdict (the maker's value governs). */
  addTorque(actor: AuthUser, jobId: number, input: TorqueEntryRequest): TorqueEntryDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const now = this.clock.now();
      this.requirePastCalibration(input.toolCalibratedOn, now);
      const verdict = this.verdict(input);
      const stored: StoredTorqueInput = { specified: input.specified, applied: input.applied, tolerancePct: input.tolerancePct ?? null };
      const row = this.uow.run(() => {
        const saved = this.repo.insertTorqueEntry({
          shopId: actor.shopId,
          jobId,
          fastener: input.fastener,
          input: { ...stored },
          result: { ...verdict },
          specValue: input.specified.min,
          specUnit: input.specified.unit,
          appliedValue: input.applied.value,
          appliedUnit: input.applied.unit,
          specSource: input.specSource,
          tool: input.tool,
          toolCalibratedOn: input.toolCalibratedOn ?? null,
          threadlocker: input.threadlocker ?? null,
          carbonPart: input.carbonPart,
          userId: actor.id,
          at: now,
        });
        this.audit.record(actor, {
          action: 'torque.recorded',
          entityType: 'job',
          entityId: jobId,
          details: { torqueEntryId: saved.id, verdict: verdict.verdict },
        });
        return saved;
      });
      return toTorqueDto(row, this.staff(actor));
    });
  }

  /** A calibration cannot lie in the future; same error shape as the zod pipe so forms mark the field. */
  private requirePastCalibration(calibratedOn: string | undefined, now: Date): void {
    if (!calibratedOn || calibratedOn <= latestCalendarDate(now)) return;
    const message = 'The calibration date cannot be in the future.';
    throw new DomainError('VALIDATION_FAILED', `toolCalibratedOn: ${message}`, { issues: [{ path: 'toolCalibratedOn', message }] });
  }

  private verdict(input: TorqueEntryRequest): TorqueVerdict {
    try {
      return torqueVerdict({ specified: input.specified, applied: input.applied, tolerancePct: input.tolerancePct, carbonPart: input.carbonPart });
    } catch (e) {
      if (isDomainInputError(e)) throw new DomainError('VALIDATION_FAILED', e.message, { domainCode: e.code, ...e.details });
      throw e;
    }
  }
}
