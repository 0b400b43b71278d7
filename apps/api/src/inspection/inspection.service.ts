import { Inject, Injectable } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import type { CheckpointDto, InspectionDto, MeasurementDto, MeasurementInputDto, MeasurementResultDto, UpdateCheckpointRequest } from '@benchproof/contracts';
import {
  areaCautions,
  DEFAULT_CHECKPOINTS,
  findCheckpoint,
  INSPECTION_AREA_LABELS,
  INSPECTION_AREAS,
  worstCondition,
  type Condition,
} from '@benchproof/domain';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { DOMAIN_EVENTS, type JobBookedInEvent } from '../core/events';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { type DbTx, UnitOfWork } from '../core/db';
import { JobAccess, JobsService, type JobRef } from '../jobs';
import { ShopsService } from '../shops';
import { InspectionRepository, type CheckpointRow, type MeasurementRow } from './inspection.repository';
import { assess, measurementContext, unitOf, type StoredResult } from './measurement-assess';

export const toMeasurementDto = (m: MeasurementRow): MeasurementDto => {
  const { trend: _trend, ...result } = m.result;
  return { id: m.id, checkpointId: m.checkpointId, kind: m.kind, input: m.input, result, unit: m.unit, userId: m.userId, at: m.at.toISOString() };
};

const toCheckpointDto = (c: CheckpointRow, ms: MeasurementRow[]): CheckpointDto => ({
  id: c.id,
  area: c.area,
  key: c.key,
  label: c.label,
  safetyCritical: c.safetyCritical,
  condition: c.condition,
  notes: c.notes,
  measurementKinds: [...(findCheckpoint(c.key)?.measurementKinds ?? [])],
  measurements: ms.filter((m) => m.checkpointId === c.id).map(toMeasurementDto),
  inspectedBy: c.inspectedBy,
  inspectedAt: c.inspectedAt?.toISOString() ?? null,
});

/** The bench inspection: the checklist laid out at book-in, conditions, and measurements with computed verdicts. */
@Injectable()
export class InspectionService {
  constructor(
    private readonly repo: InspectionRepository,
    private readonly uow: UnitOfWork,
    private readonly jobs: JobsService,
    private readonly access: JobAccess,
    private readonly bikes: BikesService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    events: EventEmitter2,
  ) {
    // A synchronous listener (not @OnEvent, which subscribes at bootstrap and swallows throws):
    // the demo seed books jobs in before app.init(), and a failed layout must roll the booking back.
    events.on(DOMAIN_EVENTS.jobBookedIn, (e: JobBookedInEvent) => this.layOutChecklist(e.shopId, e.jobId));
  }

  /** DEFAULT_CHECKPOINTS from libs/domain, so the mechanic's list is ready when the bike reaches the stand. */
  private layOutChecklist(shopId: number, jobId: number): void {
    this.repo.insertCheckpoints(
      DEFAULT_CHECKPOINTS.map((t, i) => ({ shopId, jobId, area: t.area, key: t.key, label: t.label, position: i, safetyCritical: t.safetyCritical })),
    );
  }

  /** JobAccess's per-object check: in the caller's shop and still open (or a manager's audited override). */
  private openJob(actor: AuthUser, jobId: number, tx: DbTx): JobRef {
    return this.access.change(actor, jobId, 'inspection', tx);
  }

  private checkpointOf(actor: AuthUser, jobId: number, checkpointId: number): CheckpointRow {
    const cp = this.repo.checkpoint(actor.shopId, jobId, checkpointId);
    if (!cp) throw notFound('Checkpoint');
    return cp;
  }

  get(actor: AuthUser, jobId: number): InspectionDto {
    const job = this.access.read(actor, jobId);
    const bike = this.bikes.get(actor, job.bikeId);
    const cps = this.repo.checkpoints(actor.shopId, jobId);
    const ms = this.repo.measurements(actor.shopId, [jobId]);
    const areas = INSPECTION_AREAS.map((area) => {
      const list = cps.filter((c) => c.area === area);
      return {
        area,
        label: INSPECTION_AREA_LABELS[area],
        worstCondition: worstCondition(list.map((c) => c.condition).filter((c): c is Condition => c !== null)),
        cautions: areaCautions(area, { carbonFrame: bike.frameMaterial === 'carbon' }),
        checkpoints: list.map((c) => toCheckpointDto(c, ms)),
      };
    }).filter((a) => a.checkpoints.length > 0);
    return { jobId, drivetrainSpeeds: bike.drivetrainSpeeds, inspected: cps.filter((c) => c.condition !== null).length, total: cps.length, areas };
  }

  updateCheckpoint(actor: AuthUser, jobId: number, checkpointId: number, patch: UpdateCheckpointRequest): CheckpointDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      this.checkpointOf(actor, jobId, checkpointId);
      const inspected = patch.condition === undefined ? {} : { inspectedBy: actor.id, inspectedAt: this.clock.now() };
      const row = this.repo.updateCheckpoint(actor.shopId, checkpointId, { ...patch, ...inspected });
      return toCheckpointDto(row, this.repo.measurements(actor.shopId, [jobId]));
    });
  }

  /** The verdict for a reading on this job's bike with the shop's limits, without storing anything. */
  preview(actor: AuthUser, jobId: number, input: MeasurementInputDto): MeasurementResultDto {
    const { trend: _trend, ...result } = this.assessFor(actor, this.access.read(actor, jobId), input);
    return result;
  }

  private assessFor(actor: AuthUser, job: JobRef, input: MeasurementInputDto): StoredResult {
    const bike = this.bikes.get(actor, job.bikeId);
    return assess(input, measurementContext(bike.drivetrainSpeeds, this.shops.settings(actor.shopId)));
  }

  addMeasurement(actor: AuthUser, jobId: number, checkpointId: number, input: MeasurementInputDto): MeasurementDto {
    return this.uow.run((tx) => {
      const job = this.openJob(actor, jobId, tx);
      const cp = this.checkpointOf(actor, jobId, checkpointId);
      const expected = findCheckpoint(cp.key)?.measurementKinds ?? [];
      if (!expected.includes(input.kind)) {
        throw new DomainError('VALIDATION_FAILED', `kind: this checkpoint takes ${expected.join(', ') || 'no measurements'}.`, { expected });
      }
      const result = this.assessFor(actor, job, input);
      const now = this.clock.now();
      const row = this.repo.insertMeasurement({
        shopId: actor.shopId,
        jobId,
        checkpointId,
        kind: input.kind,
        input: { ...input },
        result: { ...result },
        unit: unitOf(input),
        userId: actor.id,
        at: now,
      });
      // A reading on an unassessed checkpoint gives it the computed condition; a mechanic's own call is kept.
      if (cp.condition === null) this.repo.updateCheckpoint(actor.shopId, cp.id, { condition: result.condition, inspectedBy: actor.id, inspectedAt: now });
      return toMeasurementDto(row);
    });
  }

  deleteMeasurement(actor: AuthUser, jobId: number, measurementId: number): void {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const m = this.repo.measurement(actor.shopId, jobId, measurementId);
      if (!m) throw notFound('Measurement');
      this.repo.deleteMeasurement(actor.shopId, measurementId);
      this.audit.record(actor, { action: 'measurement.deleted', entityType: 'job', entityId: jobId, details: { measurementId, kind: m.kind } });
    });
  }

  /** Throws NOT_FOUND unless the checkpoint belongs to this job of the caller's shop (findings link to one). */
  requireCheckpoint(actor: Pick<AuthUser, 'shopId'>, jobId: number, checkpointId: number): void {
    if (!this.repo.checkpoint(actor.shopId, jobId, checkpointId)) throw notFound('Checkpoint');
  }

  /** Stored measurements of several jobs (the bike history's wear trend). */
  measurementsOfJobs(actor: Pick<AuthUser, 'shopId'>, jobIds: number[]): MeasurementRow[] {
    return this.repo.measurements(actor.shopId, jobIds);
  }
}
