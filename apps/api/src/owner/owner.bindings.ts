import { Inject, Injectable } from '@nestjs/common';
import { AnnotationRenderService } from '../annotations';
import { type FileToSend, notFound } from '../core/http';
import { STORAGE, type Storage } from '../infra/storage';
import { MediaService } from '../media';
import { PairsService } from '../pairs';
import { ReportsService } from '../reports';
import type { OwnerMediaPort, OwnerPairsPort, OwnerReportPort, OwnerShotSource } from './owner.ports';

type Scope = { shopId: number; jobId: number };
const STILLS = new Set(['photo', 'scope_still']);

/**
 * Owner media are the annotated screen renders: blur boxes burned in, never an
 * original or a plain derivative (the render falls back to the plain derivative
 * only when the photo has no annotation, so nothing is hidden that should be).
 * Thumbs are the same screen render: a plain thumb would show what a blur box covers.
 */
@Injectable()
export class AnnotatedOwnerMedia implements OwnerMediaPort {
  constructor(
    private readonly media: MediaService,
    private readonly renders: AnnotationRenderService,
    @Inject(STORAGE) private readonly storage: Storage,
  ) {}

  shotsOfFindings(scope: Scope, findingIds: number[]): Map<number, OwnerShotSource[]> {
    const out = new Map<number, OwnerShotSource[]>();
    for (const [findingId, assets] of this.media.shotsOfFindings(scope, findingIds)) {
      out.set(
        findingId,
        assets.filter((a) => STILLS.has(a.kind)).map((a) => ({ id: a.id, caption: a.caption, width: a.width, height: a.height })),
      );
    }
    return out;
  }

  async open(scope: Scope, assetId: number): Promise<FileToSend> {
    // Live stills of this job only; uprightImage refuses deleted, purged and video assets.
    if (this.media.uprightImage(scope.shopId, assetId, 'screen').jobId !== scope.jobId) throw notFound('Media');
    const img = await this.renders.annotated(scope.shopId, assetId, 'screen');
    const stat = await this.storage.stat(img.key);
    if (!stat) throw notFound('Media file');
    return {
      size: stat.bytes,
      etag: `"o${assetId}-v${img.version}"`,
      contentType: 'image/jpeg',
      cacheControl: 'private, no-cache',
      open: (range) => this.storage.createReadStream(img.key, range),
    };
  }
}

/** The job's before/after pairs, read as the owner of that one job. */
@Injectable()
export class OwnerPairsFromPairs implements OwnerPairsPort {
  constructor(private readonly pairs: PairsService) {}

  pairsOf(scope: Scope): ReturnType<OwnerPairsPort['pairsOf']> {
    const shot = (m: { id: number; caption: string; width: number | null; height: number | null }): OwnerShotSource => ({
      id: m.id,
      caption: m.caption,
      width: m.width,
      height: m.height,
    });
    return this.pairs
      .list({ kind: 'owner', ...scope }, scope.jobId)
      .map((p) => ({ id: p.id, caption: p.caption, before: shot(p.before), after: shot(p.after) }));
  }
}

/** The newest issued version, once its PDF is rendered. */
@Injectable()
export class OwnerReportFromReports implements OwnerReportPort {
  constructor(private readonly reports: ReportsService) {}

  private ready(scope: Scope) {
    const r = this.reports.latestIssued(scope.shopId, scope.jobId);
    return r && r.state === 'ready' && r.issuedAt ? { id: r.id, issuedAt: new Date(r.issuedAt) } : null;
  }

  latest(scope: Scope): { issuedAt: Date } | null {
    return this.ready(scope);
  }

  openPdf(scope: Scope): Promise<FileToSend | null> {
    const r = this.ready(scope);
    if (!r) return Promise.resolve(null);
    const pdf = this.reports.issuedPdf(scope.shopId, r.id);
    return Promise.resolve({
      size: pdf.byteSize,
      etag: `"${pdf.sha256}"`,
      contentType: pdf.contentType,
      cacheControl: 'private, no-cache',
      disposition: `attachment; filename="${pdf.filename}"`,
      ranges: false,
      open: () => pdf.stream(),
    });
  }
}
