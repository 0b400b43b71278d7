import type { OwnerActor as PolicyOwnerActor } from '@benchproof/contracts';

/** Who is calling an owner route: the policy's owner actor, plus the link it came through (consent, last viewed). */
export type OwnerActor = PolicyOwnerActor & { linkId: number };

/** Sends the owner link: by text to an owner who prefers texts, else by e-mail; desk can always copy the link too. */
export const OWNER_LINK_MAILER = Symbol('OWNER_LINK_MAILER');
export interface OwnerLinkMail {
  shopId: number;
  jobId: number;
  linkId: number;
  /** The staff member who created the link (the outbox row's author). */
  createdBy: number;
  customerId: number;
  /** The job is waiting on the owner's decision (the text then says so). */
  awaitingDecision: boolean;
  url: string;
  expiresAt: Date;
}
export type OwnerLinkSent = { status: 'queued'; channel: 'email' | 'sms'; to: string } | { status: 'not_sent'; reason: string };
export interface OwnerLinkMailerPort {
  /** Called inside the transaction that creates the link, so the message and the link commit together. */
  send(mail: OwnerLinkMail): OwnerLinkSent;
}
