import { Inject, Injectable } from '@nestjs/common';
import { roleCan, type FindingMediaDto, type MediaAssetDto, type MediaListQuery, type RetagOneRequest, type RetagRequest } from '@benchproof/contracts';
import type { PairShot } from '@benchproof/domain';

import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { FindingsService } from '../findings';
import { CLOCK, type Clock } from '../core/clock';
import { JobAccess, type JobCaller } from '../jobs';
import { MediaDerivativesService } from './media-derivatives.service';
import { toMediaDto } from './media.mapper';
import { MediaRepository, type MediaAssetRow } from './media.repository';
import { type DbTx, UnitOfWork } from '../core/db';

/** An upright derivative in storage and its pixel size. */
export interface UprightImage {
  assetId: number;
  jobId: number;
  key: string;
  width: number;
  height: number;
  sha256: string;
}

/** Media of a job: listing, tags, soft delete and purge, and the shots linked to a finding. */
@Injectable()
export class MediaService {
  constructor(
    private readonly repo: MediaRepository,
    private readonly uow: UnitOfWork,
    private readonly jobs: JobAccess,
    private readonly findings: FindingsService,
    private readonly derivatives: MediaDerivativesService,
    private readonly audit: AuditService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Throws NOT_FOUND unless the job belongs to the caller's shop. */
  assertJob(actor: AuthUser, jobId: number): void {
    this.jobs.read(actor, jobId);
  }

  /** As assertJob, and the job's evidence is not frozen (JOB_CLOSED after handover unless a manager overrides, audited in `tx`). */
  assertOpenJob(actor: AuthUser, jobId: number, tx: DbTx): void {
    this.jobs.change(actor, jobId, 'media', tx);
  }

  /** The same answer before an upload's bytes are taken, writing nothing; the upload's row calls assertOpenJob in its unit of work. */
  checkOpenJob(actor: AuthUser, jobId: number): void {
    this.jobs.check(actor, jobId, 'media');
  }

  list(actor: AuthUser, jobId: number, q: MediaListQuery): MediaAssetDto[] {
    this.assertJob(actor, jobId);
    const includeDeleted = q.includeDeleted === true && roleCan(actor.role, 'media.view_deleted');
    return this.toDtos(this.repo.listForJob(actor.shopId, jobId, { ...q, includeDeleted }));
  }

  get(actor: AuthUser, jobId: number, id: number): MediaAssetDto {
    return this.toDtos([this.owned(actor, jobId, id)])[0];
  }

  retagOne(actor: AuthUser, jobId: number, id: number, patch: RetagOneRequest): MediaAssetDto {
    return this.retag(actor, jobId, { ids: [id], ...patch })[0];
  }

  retag(actor: AuthUser, jobId: number, req: RetagRequest): MediaAssetDto[] {
    return this.uow.run((tx) => {
      this.assertOpenJob(actor, jobId, tx);
      const { ids, ...tags } = req;
      const patch = Object.fromEntries(Object.entries(tags).filter(([, v]) => v !== undefined));
      const updated = this.uow.run(() => {
        const rows = this.repo.listByIds(actor.shopId, jobId, [...new Set(ids)]);
        const missing = ids.filter((id) => !rows.some((r) => r.id === id));
        if (missing.length) throw new DomainError('NOT_FOUND', 'Some media were not found in this job.', { missing });
        const changed = rows.map((r) => this.repo.update(r.id, patch));
        for (const r of changed)
          this.audit.record(actor, { action: 'media.retagged', entityType: 'media_asset', entityId: r.id, details: { jobId, ...patch } });
        return changed;
      });
      return this.toDtos(updated);
    });
  }

  /** Soft delete: hidden from the job, original and derivatives kept until a manager purges. */
  softDelete(actor: AuthUser, jobId: number, id: number): void {
    return this.uow.run((tx) => {
      this.assertOpenJob(actor, jobId, tx);
      const row = this.owned(actor, jobId, id);
      if (row.deletedAt) return;
      this.uow.run(() => {
        this.repo.update(id, { deletedAt: this.clock.now(), deletedBy: actor.id });
        this.audit.record(actor, { action: 'media.deleted', entityType: 'media_asset', entityId: id, details: { jobId, sha256: row.sha256 } });
      });
    });
  }

  /**
   * Removes the files of a soft-deleted asset for good; the row stays as a tombstone for the audit trail.
   * Allowed on a collected job too: it removes only what was already deleted (privacy housekeeping).
   */
  async purge(actor: AuthUser, id: number): Promise<void> {
    const row = this.repo.findInShop(actor.shopId, id);
    if (!row || row.purgedAt) throw notFound('Media');
    if (!row.deletedAt) throw new DomainError('CONFLICT', 'Delete the media before purging it.');
    await this.derivatives.removeFiles(row);
    this.uow.run(() => {
      this.repo.deleteDerivatives(id);
      this.repo.update(id, { purgedAt: this.clock.now(), originalKey: null });
      this.audit.record(actor, { action: 'media.purged', entityType: 'media_asset', entityId: id, details: { jobId: row.jobId, sha256: row.sha256 } });
    });
  }

  /** Replaces the shots shown with a finding (order kept); they must be live media of the same job. */
  linkToFinding(actor: AuthUser, jobId: number, findingId: number, assetIds: number[]): FindingMediaDto {
    return this.uow.run((tx) => {
      this.assertOpenJob(actor, jobId, tx);
      this.findings.assertFinding(actor, jobId, findingId);
      const unique = [...new Set(assetIds)];
      const rows = this.repo.listByIds(actor.shopId, jobId, unique);
      const missing = unique.filter((id) => !rows.some((r) => r.id === id));
      if (missing.length) throw new DomainError('VALIDATION_FAILED', 'Only live media of this job can be linked.', { missing });
      this.uow.run(() => {
        this.repo.replaceLinks(findingId, unique);
        this.audit.record(actor, { action: 'finding.media_linked', entityType: 'finding', entityId: findingId, details: { jobId, assetIds: unique } });
      });
      return this.findingMedia(actor, jobId, findingId);
    });
  }

  findingMedia(actor: AuthUser, jobId: number, findingId: number): FindingMediaDto {
    this.findings.assertFinding(actor, jobId, findingId);
    const ids = this.repo.linksOf(findingId);
    const rows = this.repo.listByIds(actor.shopId, jobId, ids);
    const ordered = ids.map((id) => rows.find((r) => r.id === id)).filter((r): r is MediaAssetRow => Boolean(r));
    return { findingId, assets: this.toDtos(ordered) };
  }

  /** Live, ready images linked to each finding, in the mechanic's order (the owner page shows these). */
  shotsOfFindings(scope: { shopId: number; jobId: number }, findingIds: number[]): Map<number, MediaAssetDto[]> {
    const out = new Map<number, MediaAssetDto[]>();
    for (const findingId of findingIds) {
      const ids = this.repo.linksOf(findingId);
      const rows = this.repo.listByIds(scope.shopId, scope.jobId, ids).filter((r) => r.derivativeStatus === 'ready');
      const ordered = ids.map((id) => rows.find((r) => r.id === id)).filter((r): r is MediaAssetRow => Boolean(r));
      out.set(findingId, this.toDtos(ordered));
    }
    return out;
  }

  /** A live (or, for managers, soft-deleted) asset of this job in the caller's shop. */
  owned(actor: AuthUser, jobId: number, id: number): MediaAssetRow {
    this.assertJob(actor, jobId);
    const row = this.repo.findInShop(actor.shopId, id);
    if (!row || row.jobId !== jobId || row.purgedAt || (row.deletedAt && !roleCan(actor.role, 'media.view_deleted'))) throw notFound('Media');
    return row;
  }

  /** Live media of a job with what the pair rules need (kind, tags, capture time, perceptual hash). */
  pairShots(actor: JobCaller, jobId: number): ShotForPairing[] {
    this.jobs.read(actor, jobId);
    const rows = this.repo.listForJob(actor.shopId, jobId, { includeDeleted: false });
    return this.toDtos(rows).map((dto, i) => ({ dto, shot: toPairShot(rows[i]) }));
  }

  /** A live asset anywhere in the caller's shop (NOT_FOUND otherwise), so pairs can tell "another job" apart. */
  shotInShop(actor: Pick<AuthUser, 'shopId'>, id: number): ShotForPairing & { jobId: number } {
    const row = this.repo.findInShop(actor.shopId, id);
    if (!row || row.deletedAt || row.purgedAt) throw notFound('Media');
    return { dto: this.toDtos([row])[0], shot: toPairShot(row), jobId: row.jobId };
  }

  /**
   * The stored upright derivative of a live asset in the shop (for renders made from it,
   * e.g. annotated images). Soft-deleted assets are not found unless `includeDeleted`.
   */
  uprightImage(shopId: number, id: number, variant: 'screen' | 'print', opts: { includeDeleted?: boolean } = {}): UprightImage {
    const row = this.repo.findInShop(shopId, id);
    if (!row || row.purgedAt || (row.deletedAt && !opts.includeDeleted) || (row.kind !== 'photo' && row.kind !== 'scope_still')) throw notFound('Media');
    const d = this.repo.findDerivative(id, variant);
    if (!d) throw new DomainError('NOT_FOUND', 'This photo has no derivatives yet.');
    return { assetId: id, jobId: row.jobId, key: d.key, width: d.width, height: d.height, sha256: d.sha256 };
  }

  toDtos(rows: MediaAssetRow[]): MediaAssetDto[] {
    const derivatives = this.repo.derivativesOf(rows.map((r) => r.id));
    return rows.map((r) => toMediaDto(r, derivatives));
  }
}

export interface ShotForPairing {
  dto: MediaAssetDto;
  shot: PairShot;
}

function toPairShot(r: MediaAssetRow): PairShot {
  // EXIF capture time when the camera wrote one; the upload time otherwise.
  const takenAt = (r.capturedAt ?? r.uploadedAt).toISOString();
  return { id: r.id, kind: r.kind, phase: r.phase, area: r.area, takenAt, phash: r.phash };
}
