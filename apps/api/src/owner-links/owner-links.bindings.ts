import { Injectable } from '@nestjs/common';
import { CustomersService } from '../customers';
import { MailService } from '../mail';
import { TextsService } from '../texts';
import type { OwnerLinkMail, OwnerLinkMailerPort, OwnerLinkSent } from './owner-links.ports';

/**
 * The owner link goes by text to an owner whose preferred channel is texts (and who has not replied
 * STOP), else through the e-mail outbox as "your estimate needs your decision".
 */
@Injectable()
export class OutboxOwnerLinkMailer implements OwnerLinkMailerPort {
  constructor(
    private readonly mail: MailService,
    private readonly texts: TextsService,
    private readonly customers: CustomersService,
  ) {}

  send(m: OwnerLinkMail): OwnerLinkSent {
    const scope = { shopId: m.shopId };
    let textRefused: string | null = null;
    if (this.texts.prefersTexts(scope, m.customerId)) {
      const kind = m.awaitingDecision ? 'estimate_decision' : 'owner_link';
      const text = this.texts.queue(scope, { jobId: m.jobId, customerId: m.customerId, kind, link: m.url });
      if (text.status === 'queued') return { status: 'queued', channel: 'sms', to: text.to };
      textRefused = text.reason;
    }
    const email = this.customers.get(scope, m.customerId).email;
    if (!email) return { status: 'not_sent', reason: textRefused ?? 'The owner has no e-mail address; copy the link for a text message.' };
    this.mail.queueEstimateDecision({ id: m.createdBy, shopId: m.shopId }, m.jobId, m.url);
    return { status: 'queued', channel: 'email', to: email };
  }
}
