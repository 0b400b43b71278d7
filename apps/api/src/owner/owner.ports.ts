import type { OwnerActor as PolicyOwnerActor } from '@benchproof/contracts';
import type { Readable } from 'node:stream';

/**
 * What the owner page needs from other features (annotated renders, pairs,
 * reports, the mail outbox). Each is a small port bound by token in
 * owner.module.ts to an adapter in owner.bindings.ts.
 */

/** Who is calling an owner route: the policy's owner actor, plus the link it came through (consent, last viewed). */
export type OwnerActor = PolicyOwnerActor & { linkId: number };

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

/** Shots of findings and their bytes: annotated screen renders only. */
export const OWNER_MEDIA = Symbol('OWNER_MEDIA');
export interface OwnerMediaPort {
  shotsOfFindings(scope: { shopId: number; jobId: number }, findingIds: number[]): Map<number, OwnerShotSource[]>;
  open(
    scope: { shopId: number; jobId: number },
    assetId: number,
    variant: 'thumb' | 'screen',
    req: { range?: string; ifNoneMatch?: string },
  ): Promise<StreamReply>;
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
  openPdf(scope: { shopId: number; jobId: number }): Promise<StreamReply | null>;
}

/** Sends the owner link by e-mail ("estimate needs your decision"); desk can always copy the link too. */
export const OWNER_LINK_MAILER = Symbol('OWNER_LINK_MAILER');
export interface OwnerLinkMail {
  shopId: number;
  jobId: number;
  linkId: number;
  /** The staff member who created the link (the outbox row's author). */
  createdBy: number;
  to: string;
  ownerName: string;
  url: string;
  expiresAt: Date;
}
export interface OwnerLinkMailerPort {
  send(mail: OwnerLinkMail): { status: 'queued' } | { status: 'not_sent'; reason: string };
}
