import { Inject, Injectable, Logger } from '@nestjs/common';
import type { CheckoutStart, OwnerPayment } from '@benchproof/contracts';
import type { OwnerActor } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { APP_CONFIG, type AppConfig } from '../config';
import { UnitOfWork } from '../core/db';
import { DomainError } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { PAYMENT_PROVIDER, PaymentProviderError, WebhookSignatureError, type PaymentProvider, type ProviderEvent } from '../infra/payments';
import { JobAccess } from '../jobs';
import { ShopsService } from '../shops';
import { BalanceService } from './balance.service';
import { PaymentsRepository } from './payments.repository';
import { PaymentsService } from './payments.service';

/**
 * The owner pays online: a hosted checkout for exactly what is due, and the provider's signed
 * webhook as the only thing that records the payment (the browser coming back records nothing).
 */
@Injectable()
export class CheckoutService {
  private readonly log = new Logger('Payments');

  constructor(
    private readonly uow: UnitOfWork,
    private readonly repo: PaymentsRepository,
    private readonly balances: BalanceService,
    private readonly payments: PaymentsService,
    private readonly access: JobAccess,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    @Inject(PAYMENT_PROVIDER) private readonly provider: PaymentProvider,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  ownerView(owner: OwnerActor): OwnerPayment {
    const job = this.access.read(owner, owner.jobId);
    const balance = this.balances.balance(owner.shopId, owner.jobId);
    return { balance, canPay: job.status === 'ready' && balance.dueMinor > 0 };
  }

  /** Opens (or reopens) the hosted checkout for what is due now; one idempotency key per job and amount. */
  async start(owner: OwnerActor, token: string, origin: string): Promise<CheckoutStart> {
    const job = this.access.read(owner, owner.jobId);
    if (job.status !== 'ready') throw new DomainError('NOT_READY_TO_PAY', undefined, { status: job.status });
    const { dueMinor, currency } = this.balances.balance(owner.shopId, job.id);
    if (dueMinor <= 0) throw new DomainError('NOTHING_DUE');
    const open = this.repo.openCheckout(owner.shopId, job.id, dueMinor);
    if (open) return { url: open.url };
    // An expired session keeps its key at the provider, so a new attempt for the same amount counts on.
    const attempt = this.repo.checkoutCount(owner.shopId, job.id, dueMinor);
    const idempotencyKey = `checkout-job-${job.id}-amount-${dueMinor}-${attempt}`;
    const page = `${(this.cfg.PUBLIC_URL ?? origin).replace(/\/$/, '')}/o/${token}`;
    const shop = this.shops.settings(owner.shopId);
    const session = await this.provider
      .createCheckout({
        ...{ amountMinor: dueMinor, currency, description: `${shop.name}: job ${job.number}`, idempotencyKey },
        ...{ successUrl: `${page}?payment=done`, cancelUrl: `${page}?payment=cancelled`, metadata: { shopId: String(owner.shopId), jobId: String(job.id) } },
      })
      .catch((e: unknown) => {
        throw new DomainError('PAYMENT_PROVIDER_ERROR', undefined, { reason: e instanceof PaymentProviderError ? e.message : String(e) });
      });
    this.uow.run(() => {
      this.repo.insertCheckout({
        ...{ shopId: owner.shopId, jobId: job.id, providerId: session.id, idempotencyKey, amountMinor: dueMinor, currency },
        ...{ url: session.url, status: 'open', createdAt: this.clock.now() },
      });
      this.audit.record(
        { shopId: owner.shopId, id: null },
        { action: 'payment.checkout_opened', entityType: 'job', entityId: job.id, details: { amountMinor: dueMinor, session: session.id } },
      );
    });
    return { url: session.url };
  }

  /** The provider's webhook: 400 without a valid signature; a replay or an unknown session changes nothing. */
  webhook(rawBody: Buffer | undefined, signature: string | undefined): { received: true; recorded: boolean } {
    let event: ProviderEvent;
    try {
      event = this.provider.verify(rawBody, signature);
    } catch (e) {
      if (e instanceof WebhookSignatureError) throw new DomainError('WEBHOOK_SIGNATURE_INVALID', undefined, { reason: e.message });
      throw e;
    }
    if (event.type === 'other') return { received: true, recorded: false };
    const checkout = this.repo.checkoutByProviderId(event.sessionId);
    if (!checkout) {
      this.log.warn(`Webhook ${event.eventId} names an unknown checkout ${event.sessionId}`);
      return { received: true, recorded: false };
    }
    if (event.type === 'checkout.expired') {
      if (checkout.status === 'open') this.repo.setCheckoutStatus(checkout.id, 'expired');
      return { received: true, recorded: false };
    }
    if (!event.paid) return { received: true, recorded: false };
    const recorded = this.uow.run((tx) => {
      this.repo.setCheckoutStatus(checkout.id, 'complete', tx);
      const p = { paymentRef: event.paymentRef, amountMinor: event.amountMinor, currency: event.currency, expectedMinor: checkout.amountMinor };
      return this.payments.recordOnline({ shopId: checkout.shopId }, checkout.jobId, p, tx) !== null;
    });
    return { received: true, recorded };
  }
}
