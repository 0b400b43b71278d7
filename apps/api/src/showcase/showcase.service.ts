import { Inject, Injectable } from '@nestjs/common';
import {
  canOpenShowcase,
  type ConsentDto,
  type ShotPairDto,
  type ShowcaseDownloadDto,
  type ShowcaseItemDto,
  type ShowcaseQuery,
  type UpdateShowcaseItemRequest,
} from '@benchproof/contracts';
import { AuditService } from '../audit';
import { ConsentService } from '../consent';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { FindingsService } from '../findings';
import { CLOCK, type Clock } from '../core/clock';
import { type DbTx, UnitOfWork } from '../core/db';
import { JobAccess, JobsService } from '../jobs';
import { PairsService } from '../pairs';
import { ShopsService } from '../shops';
import { WorkLogService } from '../work-log';
import { draftCaption } from './showcase-caption';
import { consentProblem, namesBike, pairInScope, type ScopeProblem } from './showcase-scope';
import { ShowcaseRepository, type ShowcaseMarkRow } from './showcase.repository';

/** One item cleared for use right now: the pair, the consent that covers it, the caption to print. */
export interface ClearedItem {
  pair: ShotPairDto;
  consent: ConsentDto;
  caption: string;
}

/**
 * The showcase library. Consent is read afresh on every call (never cached), so a
 * revocation takes a job's items out at once; exports call `clear` again right
 * before each file is written.
 */
@Injectable()
export class ShowcaseService {
  constructor(
    private readonly uow: UnitOfWork,
    private readonly consent: ConsentService,
    private readonly pairs: PairsService,
    private readonly jobs: JobsService,
    private readonly access: JobAccess,
    private readonly findings: FindingsService,
    private readonly work: WorkLogService,
    private readonly repo: ShowcaseRepository,
    private readonly audit: AuditService,
    private readonly shops: ShopsService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** The policy lets desk staff view; the shop decides whether they do (SHOWCASE_DESK_OFF). */
  assertOpen(actor: AuthUser): void {
    if (!canOpenShowcase(actor.role, this.shops.settings(actor.shopId))) throw new DomainError('SHOWCASE_DESK_OFF');
  }

  list(actor: AuthUser, q: ShowcaseQuery): ShowcaseItemDto[] {
    this.assertOpen(actor);
    const marks = this.repo.marks(actor.shopId);
    const items = this.consent.currentGrants(actor.shopId).flatMap((c) => {
      if (consentProblem(c)) return [];
      return this.pairs
        .list(actor, c.jobId)
        .filter(pairInScope)
        .map((p) => this.toItem(actor, p, c, marks.get(p.id)));
    });
    return items
      .filter((i) => (!q.area || i.area === q.area) && (!q.from || i.date.slice(0, 10) >= q.from) && (!q.to || i.date.slice(0, 10) <= q.to))
      .filter((i) => q.favourites !== 'true' || i.favourite)
      .sort((a, b) => Number(b.favourite) - Number(a.favourite) || b.date.localeCompare(a.date));
  }

  /** The pair if its job's current consent covers it, else NO_CONSENT / CONSENT_REVOKED. */
  clear(actor: AuthUser, pairId: number): ClearedItem {
    this.assertOpen(actor);
    const jobId = this.pairs.jobOf(actor.shopId, pairId);
    if (jobId === null) throw notFound('Pair');
    const consent = this.consent.currentConsent(actor.shopId, jobId);
    const problem = consentProblem(consent);
    if (problem) throw new DomainError(problem, undefined, { pairId, jobId });
    const pair = this.pairs.list(actor, jobId).find((p) => p.id === pairId);
    if (!pair || !pairInScope(pair)) throw new DomainError('NO_CONSENT', undefined, { pairId, jobId });
    return { pair, consent: consent!, caption: this.captionOf(actor, pair, consent!, this.repo.mark(actor.shopId, pairId)) };
  }

  update(actor: AuthUser, pairId: number, patch: UpdateShowcaseItemRequest): ShowcaseItemDto {
    const { pair, consent } = this.clear(actor, pairId);
    if (patch.caption !== undefined && !consent.nameMakeModel && namesBike(patch.caption, this.bikeOf(actor, pair.jobId))) {
      const message = 'The owner did not allow naming the bike’s make or model.';
      throw new DomainError('NO_CONSENT', message, { issues: [{ path: 'caption', message }] });
    }
    this.uow.run(() => {
      this.repo.upsert(actor.shopId, pairId, patch, this.clock.now());
      this.audit.record(actor, { action: 'showcase.item_updated', entityType: 'job', entityId: pair.jobId, details: { pairId, fields: Object.keys(patch) } });
    });
    return this.toItem(actor, pair, consent, this.repo.mark(actor.shopId, pairId));
  }

  draft(actor: AuthUser, pairId: number): string {
    const { pair, consent } = this.clear(actor, pairId);
    return this.draftFor(actor, pair, consent);
  }

  /** The jobs a selection of pairs belongs to (a pair of another shop belongs to none). */
  jobsOf(shopId: number, pairIds: number[]): Set<number> {
    return new Set(pairIds.map((id) => this.pairs.jobOf(shopId, id)).filter((j): j is number => j !== null));
  }

  /** Why a job's items may not be used right now (NO_CONSENT, CONSENT_REVOKED), or null. */
  problemOf(shopId: number, jobId: number): ScopeProblem {
    return consentProblem(this.consent.currentConsent(shopId, jobId));
  }

  /**
   * After a revocation the job's items leave the library for good: its favourite marks and
   * edited captions are dropped in the revocation's transaction. A later consent may have a
   * narrower scope (e.g. not naming the bike), so it starts from fresh drafts.
   */
  forgetJob(tx: DbTx, shopId: number, jobId: number): void {
    const pairIds = [...this.repo.marks(shopId).keys()].filter((pairId) => this.pairs.jobOf(shopId, pairId) === jobId);
    this.repo.drop(shopId, pairIds, tx);
  }

  /** Everything exported from a job's items (audit), e.g. to take down after a revocation. */
  downloads(actor: AuthUser, jobId: number): ShowcaseDownloadDto[] {
    this.access.read(actor, jobId);
    return this.audit
      .list(actor.shopId, 'job', jobId)
      .filter((e) => e.action === 'showcase.exported')
      .map((e) => {
        const d = e.details ?? {};
        return { at: e.at, userId: e.userId, pairId: Number(d.pairId), variant: String(d.variant), size: String(d.size), bytes: Number(d.bytes) };
      });
  }

  private toItem(actor: AuthUser, p: ShotPairDto, c: ConsentDto, mark: ShowcaseMarkRow | undefined): ShowcaseItemDto {
    return {
      pairId: p.id,
      jobId: p.jobId,
      area: p.after.area,
      caption: this.captionOf(actor, p, c, mark),
      favourite: mark?.favourite ?? false,
      crop: p.crop,
      before: p.before,
      after: p.after,
      date: p.after.capturedAt ?? p.after.uploadedAt,
      consent: { grantedAt: c.at, nameMakeModel: c.nameMakeModel, wordingVersion: c.wordingVersion, method: c.method },
    };
  }

  /** The edited caption, else the pair's own, else a draft; never one naming the bike without leave. */
  private captionOf(actor: AuthUser, p: ShotPairDto, c: ConsentDto, mark: ShowcaseMarkRow | undefined): string {
    const chosen = mark?.caption ?? p.caption;
    if (chosen && (c.nameMakeModel || !namesBike(chosen, this.bikeOf(actor, p.jobId)))) return chosen;
    return this.draftFor(actor, p, c);
  }

  private draftFor(actor: AuthUser, p: ShotPairDto, c: ConsentDto): string {
    const findings = this.findings.list(actor, p.jobId);
    const workCount = this.work.listWork(actor, p.jobId).length;
    return draftCaption({ area: p.after.area, findings, workCount, bike: c.nameMakeModel ? this.bikeOf(actor, p.jobId) : null });
  }

  private bikeOf(actor: AuthUser, jobId: number): { maker: string; model: string } {
    const { bike } = this.jobs.get(actor, jobId);
    return { maker: bike.maker, model: bike.model };
  }
}
