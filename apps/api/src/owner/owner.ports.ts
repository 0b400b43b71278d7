import type { FileToSend } from '../core/http';

/**
 * What the owner page needs from other features (annotated renders, pairs,
 * reports). Each is a small port bound by token in owner.module.ts to an
 * adapter in owner.bindings.ts.
 */

export interface OwnerShotSource {
  id: number;
  caption: string;
  width: number | null;
  height: number | null;
}

/** Shots of findings and their bytes: annotated screen renders only. */
export const OWNER_MEDIA = Symbol('OWNER_MEDIA');
export interface OwnerMediaPort {
  shotsOfFindings(scope: { shopId: number; jobId: number }, findingIds: number[]): Map<number, OwnerShotSource[]>;
  open(scope: { shopId: number; jobId: number }, assetId: number, variant: 'thumb' | 'screen'): Promise<FileToSend>;
}

/** Before/after pairs of the job, in the shop's order. */
export const OWNER_PAIRS = Symbol('OWNER_PAIRS');
export interface OwnerPairsPort {
  pairsOf(scope: { shopId: number; jobId: number }): { id: number; caption: string; before: OwnerShotSource; after: OwnerShotSource }[];
}

/** The latest issued bench report of the job and its PDF, or null before one is issued and rendered. */
export const OWNER_REPORT = Symbol('OWNER_REPORT');
export interface OwnerReportPort {
  latest(scope: { shopId: number; jobId: number }): { issuedAt: Date } | null;
  openPdf(scope: { shopId: number; jobId: number }): Promise<FileToSend | null>;
}
