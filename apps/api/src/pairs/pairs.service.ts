import { Inject, Injectable } from '@nestjs/common';
import type { CreatePairRequest, PairSuggestionsDto, ReorderPairsRequest, ShotPairDto, UpdatePairRequest } from '@benchproof/contracts';
import { CreatePairRequestSchema } from '@benchproof/contracts';
import { pairProblem, PAIRABLE_KINDS, suggestPairs, type PairProblem } from '@benchproof/domain';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { JobAccess, type JobCaller } from '../jobs';
import { MediaService, type ShotForPairing } from '../media';
import { PairsRepository, type ShotPairRow } from './pairs.repository';
import { cropColumns, toPairDto } from './pairs.view';
import { type DbTx, UnitOfWork } from '../core/db';

/** Domain problem → error code and the form field it belongs under. */
const PROBLEM_ERRORS: Record<PairProblem, { code: 'PAIR_NOT_A_STILL' | 'PAIR_WRONG_PHASE'; field: 'beforeAssetId' | 'afterAssetId' }> = {
  not_a_still: { code: 'PAIR_NOT_A_STILL', field: 'beforeAssetId' },
  before_not_before: { code: 'PAIR_WRONG_PHASE', field: 'beforeAssetId' },
  after_not_after: { code: 'PAIR_WRONG_PHASE', field: 'afterAssetId' },
  same_shot: { code: 'PAIR_WRONG_PHASE', field: 'afterAssetId' },
};

/** Before/after shot pairs of a job: building, suggestions, and the list other features show. */
@Injectable()
export class PairsService {
  constructor(
    private readonly repo: PairsRepository,
    private readonly uow: UnitOfWork,
    private readonly jobs: JobAccess,
    private readonly media: MediaService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /**
   * The job's pairs in their order, each with both shots (URLs included). Pairs whose
   * shot was deleted since are left out. For the report, owner page and showcase.
   */
  list(actor: JobCaller, jobId: number): ShotPairDto[] {
    const shots = new Map(this.media.pairShots(actor, jobId).map((s) => [s.shot.id, s]));
    return this.repo.list(actor.shopId, jobId).flatMap((row) => {
      const before = shots.get(row.beforeAssetId);
      const after = shots.get(row.afterAssetId);
      return before && after ? [toPairDto(row, before.dto, after.dto)] : [];
    });
  }

  /** The job of a pair in the caller's shop, or null (the showcase holds only pair ids). */
  jobOf(shopId: number, pairId: number): number | null {
    return this.repo.jobOf(shopId, pairId);
  }

  create(actor: AuthUser, jobId: number, input: CreatePairRequest): ShotPairDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const req = CreatePairRequestSchema.parse(input);
      const before = this.shotOfJob(actor, jobId, req.beforeAssetId, 'beforeAssetId');
      const after = this.shotOfJob(actor, jobId, req.afterAssetId, 'afterAssetId');
      const problem = pairProblem(before.shot, after.shot);
      if (problem) {
        const { code, field } = PROBLEM_ERRORS[problem];
        throw new DomainError(code, undefined, { problem, issues: [{ path: field, message: messageFor(problem) }] });
      }
      if (this.repo.findByShots(actor.shopId, jobId, before.shot.id, after.shot.id)) throw new DomainError('PAIR_EXISTS');
      const now = this.clock.now();
      const row = this.uow.run(() => {
        const saved = this.repo.insert({
          shopId: actor.shopId,
          jobId,
          beforeAssetId: before.shot.id,
          afterAssetId: after.shot.id,
          caption: req.caption,
          position: this.repo.nextPosition(actor.shopId, jobId),
          ...cropColumns(req.crop),
          createdBy: actor.id,
          createdAt: now,
          updatedAt: now,
        });
        this.audit.record(actor, {
          action: 'pair.created',
          entityType: 'job',
          entityId: jobId,
          details: { pairId: saved.id, beforeAssetId: saved.beforeAssetId, afterAssetId: saved.afterAssetId },
        });
        return saved;
      });
      return toPairDto(row, before.dto, after.dto);
    });
  }

  update(actor: AuthUser, jobId: number, pairId: number, patch: UpdatePairRequest): ShotPairDto {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      this.owned(actor, jobId, pairId);
      const crop = patch.crop === undefined ? {} : cropColumns(patch.crop);
      this.uow.run(() => {
        this.repo.update(actor.shopId, pairId, { ...(patch.caption === undefined ? {} : { caption: patch.caption }), ...crop, updatedAt: this.clock.now() });
        this.audit.record(actor, { action: 'pair.updated', entityType: 'job', entityId: jobId, details: { pairId, fields: Object.keys(patch) } });
      });
      return this.one(actor, jobId, pairId);
    });
  }

  delete(actor: AuthUser, jobId: number, pairId: number): void {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const row = this.owned(actor, jobId, pairId);
      this.uow.run(() => {
        this.repo.delete(actor.shopId, pairId);
        this.audit.record(actor, {
          action: 'pair.deleted',
          entityType: 'job',
          entityId: jobId,
          details: { pairId, beforeAssetId: row.beforeAssetId, afterAssetId: row.afterAssetId },
        });
      });
    });
  }

  /** Sets the order; the request must name every pair of the job exactly once. */
  reorder(actor: AuthUser, jobId: number, req: ReorderPairsRequest): ShotPairDto[] {
    return this.uow.run((tx) => {
      this.openJob(actor, jobId, tx);
      const rows = this.repo.list(actor.shopId, jobId);
      const known = new Set(rows.map((r) => r.id));
      if (req.ids.length !== rows.length || req.ids.some((id) => !known.has(id))) {
        throw new DomainError('VALIDATION_FAILED', 'List every pair of this job once.', {
          issues: [{ path: 'ids', message: 'List every pair of this job once.' }],
        });
      }
      const now = this.clock.now();
      this.uow.run(() => {
        req.ids.forEach((id, position) => this.repo.update(actor.shopId, id, { position, updatedAt: now }));
        this.audit.record(actor, { action: 'pairs.reordered', entityType: 'job', entityId: jobId, details: { ids: req.ids } });
      });
      return this.list(actor, jobId);
    });
  }

  /** Before/after combinations of shots not yet in a pair, likeliest first. */
  suggestions(actor: AuthUser, jobId: number, limit = 20): PairSuggestionsDto {
    const shots = this.media.pairShots(actor, jobId).filter((s) => PAIRABLE_KINDS.includes(s.shot.kind));
    const byId = new Map(shots.map((s) => [s.shot.id, s]));
    const paired = new Set(this.repo.list(actor.shopId, jobId).flatMap((r) => [r.beforeAssetId, r.afterAssetId]));
    const ranked = suggestPairs(
      shots.map((s) => s.shot),
      paired,
    ).slice(0, limit);
    return {
      suggestions: ranked.map(({ beforeId, afterId, ...rest }) => ({ before: byId.get(beforeId)!.dto, after: byId.get(afterId)!.dto, ...rest })),
      pendingHashes: shots.filter((s) => !s.shot.phash && (s.shot.phase === 'before' || s.shot.phase === 'after')).length,
    };
  }

  private one(actor: AuthUser, jobId: number, pairId: number): ShotPairDto {
    const dto = this.list(actor, jobId).find((p) => p.id === pairId);
    if (!dto) throw notFound('Pair');
    return dto;
  }

  private owned(actor: AuthUser, jobId: number, pairId: number): ShotPairRow {
    const row = this.repo.find(actor.shopId, jobId, pairId);
    if (!row) throw notFound('Pair');
    return row;
  }

  private openJob(actor: AuthUser, jobId: number, tx: DbTx): void {
    // Pairs are evidence: they freeze at handover like the shots themselves (JobAccess).
    this.jobs.change(actor, jobId, 'media', tx);
  }

  private shotOfJob(actor: AuthUser, jobId: number, assetId: number, field: string): ShotForPairing {
    const found = this.media.shotInShop(actor, assetId);
    if (found.jobId !== jobId) throw new DomainError('PAIR_OTHER_JOB', undefined, { issues: [{ path: field, message: 'This shot belongs to another job.' }] });
    return found;
  }
}

function messageFor(problem: PairProblem): string {
  switch (problem) {
    case 'not_a_still':
      return 'Videos cannot be paired; pick a photo or a scope still.';
    case 'before_not_before':
      return 'This shot is not tagged Before.';
    case 'after_not_after':
      return 'This shot is not tagged After.';
    case 'same_shot':
      return 'Pick two different shots.';
  }
}
