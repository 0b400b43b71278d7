import type { OwnerActor as PolicyOwnerActor } from '@benchproof/contracts';

/** Who is calling an owner route: the policy's owner actor, plus the link it came through (consent, last viewed). */
export type OwnerActor = PolicyOwnerActor & { linkId: number };

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
