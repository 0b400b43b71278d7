import { Inject, Injectable, Logger } from '@nestjs/common';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { CustomersService } from '../customers';
import type { TextStatus } from '../db/schema';
import { TEXT_PROVIDER, TextProvider } from '../infra/texts';
import { TextsRepository } from './texts.repository';

/** The provider's default opt-out and opt-in keywords (from memory; common practice for short-message senders). */
const STOP_WORDS = new Set(['STOP', 'STOPALL', 'UNSUBSCRIBE', 'CANCEL', 'END', 'QUIT']);
const START_WORDS = new Set(['START', 'UNSTOP', 'YES']);

/** Provider statuses we keep; the rest (accepted, scheduled, sending…) say nothing desk needs. */
const KEPT: Record<string, TextStatus> = { sent: 'sent', delivered: 'delivered', undelivered: 'undelivered', failed: 'failed' };

type Params = Record<string, string>;

/** What the provider posts back: delivery reports and the owners' replies, each signed (X-Twilio-Signature). */
@Injectable()
export class TextsWebhooks {
  private readonly logger = new Logger('Texts');

  constructor(
    private readonly repo: TextsRepository,
    private readonly customers: CustomersService,
    private readonly audit: AuditService,
    private readonly uow: UnitOfWork,
    @Inject(TEXT_PROVIDER) private readonly provider: TextProvider,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** The URL the provider signed is the one we gave it: our configured address plus the path and query it called. */
  private verify(pathAndQuery: string, signature: string | undefined, params: Params): void {
    if (!this.provider.signatureOk(signature, `${this.cfg.publicUrl}${pathAndQuery}`, params)) throw new DomainError('WEBHOOK_SIGNATURE_INVALID');
  }

  /** A delivery report for one of our texts (shop and text named in the callback URL we gave). */
  status(pathAndQuery: string, signature: string | undefined, params: Params): { updated: boolean } {
    this.verify(pathAndQuery, signature, params);
    const q = new URL(pathAndQuery, 'http://x').searchParams;
    const kept = KEPT[params.MessageStatus ?? ''];
    const shopId = Number(q.get('shop'));
    const textId = Number(q.get('text'));
    if (!kept || !Number.isInteger(shopId) || !Number.isInteger(textId)) return { updated: false };
    const error = params.ErrorCode ? `Provider error ${params.ErrorCode}` : null;
    return { updated: this.repo.recordStatus(shopId, textId, params.MessageSid ?? '', kept, error, this.clock.now()) };
  }

  /** An owner's reply: STOP (and the like) records the opt-out for every customer we texted at that number; START undoes it. */
  inbound(pathAndQuery: string, signature: string | undefined, params: Params): void {
    this.verify(pathAndQuery, signature, params);
    const word = (params.Body ?? '').trim().toUpperCase();
    const stop = STOP_WORDS.has(word);
    if (!stop && !START_WORDS.has(word)) return;
    const at = this.clock.now();
    const reached = this.repo.shopsTexting(params.From ?? '');
    this.uow.run(() => {
      for (const { shopId, customerId } of reached) {
        this.customers.setTextOptOut({ shopId }, customerId, stop ? at : null);
        const action = stop ? 'customer.texts_stopped' : 'customer.texts_restarted';
        this.audit.record({ shopId, id: null }, { action, entityType: 'customer', entityId: customerId, details: { reply: word } });
      }
    });
    this.logger.log(`Reply ${word} from a texted number: ${reached.length} customer record(s) ${stop ? 'opted out' : 'opted in again'}`);
  }
}
