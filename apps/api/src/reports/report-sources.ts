import { Inject, Injectable } from '@nestjs/common';
import { buffer } from 'node:stream/consumers';
import type { AuthUser } from '../core/auth';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { MediaFilesService } from '../media';
import type { ReportImage, ShotRef } from './report-data';

/**
 * The JPEG the report prints for a shot: the asset's print derivative, or —
 * once annotations exist — the annotated print render with its blur boxes burned in.
 * The bytes are embedded as they are, so they must already be sized for print.
 */
export interface AnnotatedImageSource {
  printJpeg(actor: AuthUser, assetId: number): Promise<ReportImage | null>;
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

/** Default shot source: the plain print derivative (no annotations yet). */
@Injectable()
export class PrintDerivativeSource implements AnnotatedImageSource {
  constructor(
    private readonly files: MediaFilesService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
  ) {}

  async printJpeg(actor: AuthUser, assetId: number): Promise<ReportImage | null> {
    try {
      const reply = await this.files.open(actor, assetId, 'print', {});
      if (!reply.body || !reply.headers['Content-Type']?.includes('jpeg')) return null;
      const data = await buffer(reply.body);
      const { width, height } = await this.image.size(data);
      return { data, width, height };
    } catch {
      return null;
    }
  }
}

/** Default pairs source until the pairs feature is bound: none. */
@Injectable()
export class NoPairsSource implements PairsSource {
  listPairs(): Promise<ReportPair[]> {
    return Promise.resolve([]);
  }
}
