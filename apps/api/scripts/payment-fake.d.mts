/** Types for payment-fake.mjs (plain JS so it runs with no build). */
export interface FakeCheckoutSession {
  id: string;
  object: 'checkout.session';
  status: 'open' | 'complete' | 'expired';
  payment_status: 'paid' | 'unpaid';
  payment_intent: string | null;
  amount_total: number;
  currency: string;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  url: string;
}

export interface FakeEvent {
  id: string;
  type: string;
  data: { object: FakeCheckoutSession };
}

export interface FakeDelivery {
  id: string;
  status: number | null;
  error: string | null;
}

export interface PaymentFake {
  port: number;
  url: string;
  sessions(): FakeCheckoutSession[];
  requests(): { method: string; path: string; idempotencyKey: string | null; params: Record<string, unknown> }[];
  events(): { event: FakeEvent; deliveries: FakeDelivery[] }[];
  refunds(): { id: string; amount: number; payment_intent: string }[];
  setWebhookUrl(url: string): void;
  pay(sessionId: string): Promise<FakeCheckoutSession | null>;
  expire(sessionId: string): Promise<FakeCheckoutSession | null>;
  resend(eventId: string): Promise<FakeDelivery>;
  close(): Promise<void>;
}

export function parseForm(body: string): Record<string, unknown>;
export function startPaymentFake(opts?: {
  port?: number;
  host?: string;
  webhookUrl?: string;
  webhookSecret?: string;
  deliverWebhooks?: boolean;
}): Promise<PaymentFake>;
