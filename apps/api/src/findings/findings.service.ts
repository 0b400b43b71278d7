import { Inject, Injectable } from '@nestjs/common';
import type {
  CreateFindingRequest,
  DecisionDto,
  EstimateDto,
  FindingDto,
  RecommendationDto,
  RecommendationRequest,
  RecordDecisionRequest,
  UpdateFindingRequest,
} from '@benchproof/contracts';
import { defaultUrgency } from '@benchproof/domain';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { AuditService } from '../audit';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { publish, RecommendationDecidedEvent } from '../core/events';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { InspectionService } from '../inspection';
import { JobAccess, type EvidenceKind, type JobCaller, type JobRef } from '../jobs';
import { ShopsService } from '../shops';
import { type FindingRow, FindingsRepository, type RecommendationRow } from './findings.repository';
import { addTotals, recommendationTotals, toDecisionDto, toFindingDto, toRecommendationDto, ZERO_TOTALS } from './findings.view';
import { type DbTx, UnitOfWork } from '../core/db';

/** One decision on a recommendation, from staff (phone, in person, e-mail) or from the owner page (owner_link). */
export interface DecisionInput {
  status: 'pending' | 'approved' | 'declined';
  channel: 'phone' | 'in_person' | 'email' | 'owner_link';
  decidedByName: string;
  /** The staff member who recorded it; null when the owner decided on their own page. */
  recordedBy: number | null;
  decidedAt: Date;
  note: string;
  /**
   * The version and gross price the decider saw (owner page). When desk has
   * re-priced since, the decision is refused with PRICE_CHANGED instead of
   * binding the owner to a price they never saw.
   */
  seen?: { updatedAt: string; grossMinor: number };
}

@Injectable()
export class FindingsService {
  constructor(
    private readonly repo: FindingsRepository,
    private readonly uow: UnitOfWork,
    private readonly jobs: JobAccess,
    private readonly bikes: BikesService,
    private readonly inspection: InspectionService,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly emitter: EventEmitter2,
  ) {}

  /** JobAccess's per-object check: in the caller's shop and still open (or a manager's audited override). */
  private openJob(actor: AuthUser, jobId: number, tx: DbTx, what: EvidenceKind = 'finding'): JobRef {
    return this.jobs.change(actor, jobId, what, tx);
  }

  /** NOT_FOUND unless the finding belongs to this job of the caller's shop (media links use this; the row stays here). */
  assertFinding(actor: AuthUser, jobId: number, findingId: number): void {
    this.owned(actor, jobId, findingId);
  }

  private owned(actor: AuthUser, jobId: number, findingId: number): FindingRow {
    this.jobs.read(actor, jobId);
    const f = this.repo.find(actor.shopId, jobId, findingId);
    if (!f) throw notFound('Finding');
    return f;
  }

  private dtos(actor: Pick<AuthUser, 'shopId'>, job: JobRef, rows: FindingRow[]): FindingDto[] {
    const carbon = this.bikes.get(actor, job.bikeId).frameMaterial === 'carbon';
    const recs = this.repo.recommendations(actor.shopId, job.id);
    const decisions = this.repo.decisions(
      actor.shopId,
      recs.map((r) => r.id),
    );
    return rows.map((f) =>
      toFindingDto(
        f,
        recs.find((r) => r.findingId === f.id),
        decisions,
        carbon,
      ),
    );
  }

  list(actor: JobCaller, jobId: number): FindingDto[] {
    const job = this.jobs.read(actor, jobId);
    return this.dtos(actor, job, this.repo.list(actor.shopId, jobId));
  }

  create(actor: AuthUser, jobId: number, input: CreateFindingRequest): FindingDto {
    return this.uow.run((tx) => {
      const job = this.openJob(actor, jobId, tx);
      if (input.checkpointId) this.inspection.requireCheckpoint(actor, jobId, input.checkpointId);
      const now = this.clock.now();
      const row = this.uow.run(() => this.repo.insert({ ...input, shopId: actor.shopId, jobId, createdBy: actor.id, createdAt: now, updatedAt: now }));
      return this.dtos(actor, job, [row])[0];
    });
  }

  update(actor: AuthUser, jobId: number, findingId: number, patch: UpdateFindingRequest): FindingDto {
    return this.uow.run((tx) => {
      const job = this.openJob(actor, jobId, tx);
      this.owned(actor, jobId, findingId);
      if (patch.checkpointId) this.inspection.requireCheckpoint(actor, jobId, patch.checkpointId);
      const row = this.uow.run(() => this.repo.update(actor.shopId, findingId, { ...patch, updatedAt: this.clock.now() }));
      return this.dtos(actor, job, [row])[0];
    });
  }

  delete(actor: AuthUser, jobId: number, findingId: number): void {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      this.owned(actor, jobId, findingId);
      try {
        this.uow.run(() => {
          this.repo.delete(actor.shopId, findingId);
          this.audit.record(actor, { action: 'finding.deleted', entityType: 'job', entityId: jobId, details: { findingId } });
        });
      } catch (e) {
        // finding_media (media feature) still points at it: the shots must be unlinked first.
        if ((e as { code?: string }).code === 'SQLITE_CONSTRAINT_FOREIGNKEY')
          throw new DomainError('CONFLICT', 'Unlink the shots of this finding before deleting it.');
        throw e;
      }
    });
  }

  /** Creates or replaces the finding's recommendation at the shop's current labour rate, tax rate and currency. */
  setRecommendation(actor: AuthUser, jobId: number, findingId: number, input: RecommendationRequest): RecommendationDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx, 'recommendation');
      const finding = this.owned(actor, jobId, findingId);
      const shop = this.shops.settings(actor.shopId);
      const now = this.clock.now();
      const urgency = input.urgency ?? defaultUrgency(finding.condition);
      const priced = {
        summary: input.summary,
        urgency,
        parts: input.parts,
        labourHundredths: input.labourHundredths,
        labourRateMinor: shop.labourRateMinor,
        taxRateBp: shop.taxRateBp,
        currency: shop.currency,
        updatedAt: now,
      };
      const existing = this.repo.recommendationOf(actor.shopId, findingId);
      // A changed price needs the owner's word again.
      const row = this.uow.run(() => {
        const saved = existing
          ? this.repo.updateRecommendation(actor.shopId, existing.id, { ...priced, decisionStatus: 'pending' })
          : this.repo.insertRecommendation({ ...priced, shopId: actor.shopId, jobId, findingId, createdBy: actor.id, createdAt: now });
        this.audit.record(actor, {
          action: existing ? 'recommendation.replaced' : 'recommendation.created',
          entityType: 'job',
          entityId: jobId,
          details: { recommendationId: saved.id, previousDecision: existing?.decisionStatus ?? null },
        });
        return saved;
      });
      return toRecommendationDto(row, this.repo.decisions(actor.shopId, [row.id]), finding.condition);
    });
  }

  estimate(actor: JobCaller, jobId: number): EstimateDto {
    const job = this.jobs.read(actor, jobId);
    const items = this.dtos(actor, job, this.repo.list(actor.shopId, jobId)).flatMap((f) =>
      f.recommendation ? [{ ...f, recommendation: f.recommendation }] : [],
    );
    const totals = { all: ZERO_TOTALS, approved: ZERO_TOTALS, pending: ZERO_TOTALS, declined: ZERO_TOTALS };
    for (const { recommendation: r } of items) {
      totals.all = addTotals(totals.all, r.totals);
      totals[r.decisionStatus] = addTotals(totals[r.decisionStatus], r.totals);
    }
    return { jobId, currency: items[0]?.recommendation.currency ?? this.shops.settings(actor.shopId).currency, items, totals };
  }

  /** Staff record a decision the owner gave by phone, in person or by e-mail. */
  recordDecision(actor: AuthUser, jobId: number, recommendationId: number, input: RecordDecisionRequest): DecisionDto {
    const decidedAt = input.decidedAt ? new Date(input.decidedAt) : this.clock.now();
    return this.decide(actor, jobId, recommendationId, { ...input, recordedBy: actor.id, decidedAt });
  }

  /**
   * The one way a decision is stored, for staff and for the owner page alike
   * (channel owner_link, recordedBy null). JobAccess checks the actor the same
   * way for both: a closed job is JOB_CLOSED for the owner and for desk, and a
   * manager's correction is the audited override. Row, recommendation status,
   * event and audit entry commit together (inside the caller's transaction, if any).
   */
  decide(actor: JobCaller, jobId: number, recommendationId: number, d: DecisionInput): DecisionDto {
    const shopId = actor.shopId;
    return this.uow.run((tx) => {
      this.jobs.change(actor, jobId, 'decision', tx);
      const rec: RecommendationRow | undefined = this.repo.recommendation(shopId, jobId, recommendationId);
      if (!rec) throw notFound('Recommendation');
      if (d.seen) this.requireSeenPrice(rec, d.seen);
      const inserted = this.repo.insertDecision({ ...d, shopId, jobId, recommendationId, recordedAt: this.clock.now() });
      this.repo.updateRecommendation(shopId, rec.id, { decisionStatus: d.status });
      publish(this.emitter, new RecommendationDecidedEvent(tx, shopId, jobId, rec.id, d.status, d.channel));
      this.audit.record(d.recordedBy === null ? { shopId, id: null } : { shopId, id: d.recordedBy }, {
        action: 'recommendation.decided',
        entityType: 'job',
        entityId: jobId,
        details: { recommendationId, summary: rec.summary, status: d.status, channel: d.channel, decidedByName: d.decidedByName },
      });
      return toDecisionDto(inserted);
    });
  }

  private requireSeenPrice(rec: RecommendationRow, seen: { updatedAt: string; grossMinor: number }): void {
    const grossMinor = recommendationTotals(rec).grossMinor;
    if (rec.updatedAt.getTime() === new Date(seen.updatedAt).getTime() && grossMinor === seen.grossMinor) return;
    throw new DomainError('PRICE_CHANGED', undefined, { recommendationId: rec.id, grossMinor, currency: rec.currency, updatedAt: rec.updatedAt.toISOString() });
  }
}
