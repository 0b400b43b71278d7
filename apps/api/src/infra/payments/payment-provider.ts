import type Stripe from 'stripe';
import type { AppConfig } from '../../config';

/** A hosted checkout as BenchProof needs it: the exact amount, where to come back to, and our references. */
export interface CheckoutRequest {
  amountMinor: number;
  currency: string;
  description: string;
  successUrl: string;
  cancelUrl: string;
  /** Copied to the session's metadata (shop and job ids). */
  metadata: Record<string, string>;
  /** Same key, same session: a double tap or a retry cannot open a second checkout. */
  idempotencyKey: string;
}

export interface CheckoutSession {
  id: string;
  url: string;
  amountMinor: number;
  currency: string;
}

/** A verified provider event, reduced to what the payments feature acts on. */
export type ProviderEvent =
  | { type: 'checkout.completed'; eventId: string; sessionId: string; paymentRef: string; amountMinor: number; currency: string; paid: boolean }
  | { type: 'checkout.expired'; eventId: string; sessionId: string }
  | { type: 'other'; eventId: string; providerType: string };

export class WebhookSignatureError extends Error {}
export class PaymentProviderError extends Error {}

/** The SDK's client options: the local fake or another endpoint through its documented host/port/protocol settings. */
export function stripeOptions(apiUrl: string): Stripe.StripeConfig {
  const base: Stripe.StripeConfig = { maxNetworkRetries: 1, telemetry: false, timeout: 15_000 };
  if (apiUrl === 'provider') return base;
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'http:' ? 'http' : 'https';
  return { ...base, host: url.hostname, port: Number(url.port || (protocol === 'http' ? 80 : 443)), protocol };
}

/** Card payments through the provider's own SDK; a real account needs configuration only. */
export class PaymentProvider {
  private client: Stripe | undefined;

  constructor(private readonly cfg: Pick<AppConfig, 'STRIPE_SECRET_KEY' | 'STRIPE_WEBHOOK_SECRET' | 'STRIPE_API_URL'>) {}

  /**
   * The SDK, loaded with the first checkout or webhook rather than at boot: about 17 MB of resident memory
   * (issue 22) that a shop taking no card payments never uses. The SDK is CommonJS: require gives the class.
   */
  private get sdk(): Stripe {
    if (this.client) return this.client;
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above
    const StripeSdk = require('stripe') as typeof Stripe;
    return (this.client = new StripeSdk(this.cfg.STRIPE_SECRET_KEY, stripeOptions(this.cfg.STRIPE_API_URL)));
  }

  async createCheckout(r: CheckoutRequest): Promise<CheckoutSession> {
    const params: Stripe.Checkout.SessionCreateParams = {
      mode: 'payment',
      line_items: [{ quantity: 1, price_data: { currency: r.currency.toLowerCase(), unit_amount: r.amountMinor, product_data: { name: r.description } } }],
      success_url: r.successUrl,
      cancel_url: r.cancelUrl,
      client_reference_id: r.metadata.jobId,
      metadata: { ...r.metadata, description: r.description },
    };
    const s = await this.call(() => this.sdk.checkout.sessions.create(params, { idempotencyKey: r.idempotencyKey }));
    if (!s.url || s.amount_total !== r.amountMinor) throw new PaymentProviderError(`Checkout ${s.id} came back without a page or with another amount`);
    return { id: s.id, url: s.url, amountMinor: s.amount_total, currency: s.currency ?? r.currency };
  }

  /** Gives money back on an online payment; returns the provider's refund id. */
  async refund(paymentRef: string, amountMinor: number, idempotencyKey: string): Promise<string> {
    const refund = await this.call(() => this.sdk.refunds.create({ payment_intent: paymentRef, amount: amountMinor }, { idempotencyKey }));
    return refund.id;
  }

  /** Verifies the signature over the raw body (the SDK's constructEvent) and reduces the event; throws WebhookSignatureError. */
  verify(rawBody: Buffer | undefined, signature: string | undefined): ProviderEvent {
    let event: Stripe.Event;
    try {
      if (!rawBody || !signature) throw new Error('missing body or signature');
      event = this.sdk.webhooks.constructEvent(rawBody, signature, this.cfg.STRIPE_WEBHOOK_SECRET);
    } catch (e) {
      throw new WebhookSignatureError(e instanceof Error ? e.message : String(e));
    }
    if (event.type === 'checkout.session.completed' || event.type === 'checkout.session.async_payment_succeeded') {
      const s = event.data.object;
      const paymentRef = typeof s.payment_intent === 'string' ? s.payment_intent : (s.payment_intent?.id ?? s.id);
      const paid = s.payment_status === 'paid';
      return { type: 'checkout.completed', eventId: event.id, sessionId: s.id, paymentRef, amountMinor: s.amount_total ?? 0, currency: s.currency ?? '', paid };
    }
    if (event.type === 'checkout.session.expired') return { type: 'checkout.expired', eventId: event.id, sessionId: event.data.object.id };
    return { type: 'other', eventId: event.id, providerType: event.type };
  }

  private async call<T>(fn: () => Promise<T>): Promise<T> {
    try {
      return await fn();
    } catch (e) {
      throw new PaymentProviderError(e instanceof Error ? e.message : String(e));
    }
  }
}

export const PAYMENT_PROVIDER = Symbol('PAYMENT_PROVIDER');
