import type { Readable } from 'node:stream';

/**
 * What the owner page needs from features that arrive in parallel (annotated
 * renders, pairs, reports, the mail outbox). Each is a small port bound by
 * token in owner.module.ts; the defaults work with what exists today and the
 * lead re-binds them when merging (see DEVELOPERS.md, owner link).
 */

/** Who is calling an owner route: the owner-link visitor of one job. */
export interface OwnerActor {
  kind: 'owner';
  shopId: number;
  jobId: number;
  linkId: number;
}

export interface StreamReply {
  status: 200 | 206 | 304 | 416;
  headers: Record<string, string>;
  body: Readable | null;
}

export interface OwnerShotSource {
  id: number;
  caption: string;
  width: number | null;
  height: number | null;
}

/** Shots of findings and their bytes, screen-sized only. Bind to the annotated renders when they exist. */
export const OWNER_MEDIA = Symbol('OWNER_MEDIA');
export interface OwnerMediaPort {
  shotsOfFindings(scope: { shopId: number; jobId: number }, findingIds: number[]): Map<number, OwnerShotSource[]>;
  open(scope: { shopId: number; jobId: number }, assetId: number, variant: 'thumb' | 'screen', req: { range?: string; ifNoneMatch?: string }): Promise<StreamReply>;
}

/** Before/after pairs of the job, in the shop's order. Default: none. */
export const OWNER_PAIRS = Symbol('OWNER_PAIRS');
export interface OwnerPairsPort {
  pairsOf(scope: { shopId: number; jobId: number }): { id: number; caption: string; before: OwnerShotSource; after: OwnerShotSource }[];
}

/** The latest issued bench report of the job and its PDF. Default: none issued. */
export const OWNER_REPORT = Symbol('OWNER_REPORT');
export interface OwnerReportPort {
  latest(scope: { shopId: number; jobId: number }): { issuedAt: Date } | null;
  openPdf(scope: { shopId: number; jobId: number }): Promise<StreamReply | null>;
}

/** Sends the owner link by e-mail ("estimate needs your decision"). Default: not sent, desk copies the link. */
export const OWNER_LINK_MAILER = Symbol('OWNER_LINK_MAILER');
export interface OwnerLinkMail {
  shopId: number;
  jobId: number;
  linkId: number;
  to: string;
  ownerName: string;
  url: string;
  expiresAt: Date;
}
export interface OwnerLinkMailerPort {
  send(mail: OwnerLinkMail): { status: 'queued' } | { status: 'not_sent'; reason: string };
}
