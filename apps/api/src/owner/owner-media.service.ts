import { Inject, Injectable } from '@nestjs/common';
import { type FileToSend, notFound } from '../core/http';
import { FindingsService } from '../findings';
import type { OwnerActor } from '../owner-links';
import { OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT, type OwnerMediaPort, type OwnerPairsPort, type OwnerReportPort } from './owner.ports';

/**
 * Bytes for the owner page. Only shots the page itself shows (linked to a
 * finding or in a pair) are served: a photo of the job that the shop did not
 * put in front of the owner stays private, even with a guessed id.
 */
@Injectable()
export class OwnerMediaService {
  constructor(
    private readonly findings: FindingsService,
    @Inject(OWNER_MEDIA) private readonly media: OwnerMediaPort,
    @Inject(OWNER_PAIRS) private readonly pairs: OwnerPairsPort,
    @Inject(OWNER_REPORT) private readonly reports: OwnerReportPort,
  ) {}

  private shown(owner: OwnerActor): Set<number> {
    const scope = { shopId: owner.shopId, jobId: owner.jobId };
    const ids = new Set<number>();
    const findingIds = this.findings.list(owner, owner.jobId).map((f) => f.id);
    for (const shots of this.media.shotsOfFindings(scope, findingIds).values()) for (const s of shots) ids.add(s.id);
    for (const p of this.pairs.pairsOf(scope)) ids.add(p.before.id).add(p.after.id);
    return ids;
  }

  open(owner: OwnerActor, assetId: number, variant: 'thumb' | 'screen'): Promise<FileToSend> {
    if (!this.shown(owner).has(assetId)) throw notFound('Media');
    return this.media.open({ shopId: owner.shopId, jobId: owner.jobId }, assetId, variant);
  }

  report(owner: OwnerActor): Promise<FileToSend | null> {
    return this.reports.openPdf({ shopId: owner.shopId, jobId: owner.jobId });
  }
}
