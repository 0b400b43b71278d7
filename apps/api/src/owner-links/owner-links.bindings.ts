import { Injectable } from '@nestjs/common';
import { MailService } from '../mail';
import type { OwnerLinkMail, OwnerLinkMailerPort } from './owner-links.ports';

/** The owner link goes out through the outbox as "your estimate needs your decision". */
@Injectable()
export class OutboxOwnerLinkMailer implements OwnerLinkMailerPort {
  constructor(private readonly mail: MailService) {}

  send(m: OwnerLinkMail): ReturnType<OwnerLinkMailerPort['send']> {
    this.mail.queueEstimateDecision({ id: m.createdBy, shopId: m.shopId }, m.jobId, m.url);
    return { status: 'queued' };
  }
}
