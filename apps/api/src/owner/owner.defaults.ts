import { Injectable } from '@nestjs/common';
import { MediaFilesService, MediaService } from '../media';
import type { OwnerLinkMailerPort, OwnerMediaPort, OwnerPairsPort, OwnerReportPort, OwnerShotSource, StreamReply } from './owner.ports';

/** Plain screen/thumb derivatives of the shots linked to findings (until annotated renders are bound). */
@Injectable()
export class DerivativeOwnerMedia implements OwnerMediaPort {
  constructor(
    private readonly media: MediaService,
    private readonly files: MediaFilesService,
  ) {}

  shotsOfFindings(scope: { shopId: number; jobId: number }, findingIds: number[]): Map<number, OwnerShotSource[]> {
    const out = new Map<number, OwnerShotSource[]>();
    for (const [findingId, assets] of this.media.shotsOfFindings(scope, findingIds)) {
      out.set(findingId, assets.filter((a) => a.kind !== 'video' && a.kind !== 'scope_video').map((a) => ({ id: a.id, caption: a.caption, width: a.width, height: a.height })));
    }
    return out;
  }

  open(scope: { shopId: number; jobId: number }, assetId: number, variant: 'thumb' | 'screen', req: { range?: string; ifNoneMatch?: string }): Promise<StreamReply> {
    return this.files.openDerivativeOfJob(scope, assetId, variant, req);
  }
}

/** No pairs feature yet: the page hides the pairs section. */
export const noPairs: OwnerPairsPort = { pairsOf: () => [] };

/** No reports feature yet: the page hides the report section. */
export const noReport: OwnerReportPort = { latest: () => null, openPdf: () => Promise.resolve(null) };

/** No outbox yet: desk copies the link (for a text message or their own e-mail). */
export const noMail: OwnerLinkMailerPort = { send: () => ({ status: 'not_sent', reason: 'E-mail sending is not set up yet; copy the link and send it yourself.' }) };
