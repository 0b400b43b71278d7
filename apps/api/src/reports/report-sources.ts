import { Injectable } from '@nestjs/common';
import { AnnotationRenderService } from '../annotations';
import type { AuthUser } from '../core/auth';
import { PairsService } from '../pairs';
import type { ReportImage, ShotRef } from './report-data';

/**
 * The JPEG the report prints for a shot: the annotated print render with its
 * blur boxes burned in (the plain print derivative when there is no annotation).
 * The bytes are embedded as they are, so they must already be sized for print.
 */
export interface AnnotatedImageSource {
  printJpeg(shopId: number, assetId: number): Promise<ReportImage | null>;
}
export const ANNOTATED_IMAGE_SOURCE = Symbol('ANNOTATED_IMAGE_SOURCE');

/** A before/after pair as the report prints it. */
export interface ReportPair {
  before: ShotRef;
  after: ShotRef;
  caption: string;
}

/** The job's before/after pairs, in the order the shop set. */
export interface PairsSource {
  listPairs(actor: AuthUser, jobId: number): Promise<ReportPair[]>;
}
export const PAIRS_SOURCE = Symbol('PAIRS_SOURCE');

/** Shots as the report prints them: the annotated print render (blur boxes burned in), or the plain print derivative without an annotation. */
@Injectable()
export class AnnotatedPrintSource implements AnnotatedImageSource {
  constructor(private readonly renders: AnnotationRenderService) {}

  async printJpeg(shopId: number, assetId: number): Promise<ReportImage | null> {
    try {
      const { data, width, height } = await this.renders.annotatedWithBytes(shopId, assetId, 'print');
      return { data, width, height };
    } catch {
      // A video, or a photo whose derivatives are not made yet: the report prints the caption without the picture.
      return null;
    }
  }
}

/** The job's pairs from the pairs feature, each shot with its own caption. */
@Injectable()
export class PairsFromPairsService implements PairsSource {
  constructor(private readonly pairs: PairsService) {}

  listPairs(actor: AuthUser, jobId: number): Promise<ReportPair[]> {
    const ref = (m: { id: number; caption: string }): ShotRef => ({ assetId: m.id, caption: m.caption });
    return Promise.resolve(this.pairs.list(actor, jobId).map((p) => ({ before: ref(p.before), after: ref(p.after), caption: p.caption })));
  }
}
