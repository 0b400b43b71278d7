import type { JobPage, JobPayments, OutboxMessageDto, OwnerPayment } from '@benchproof/contracts';
import Stripe from 'stripe';
import { appWithPaymentFake, readyJob, type PaymentFake } from '../payments/payment-fixtures';
import { DEMO, type SignedIn, type TestApp } from '../test-app';

const payments = async (s: SignedIn, jobId: number) => (await s.agent.get(`/api/jobs/${jobId}/payments`).expect(200)).body as JobPayments;
const ownerPayment = async (t: TestApp, token: string) => (await t.http().get(`/api/owner/${token}/payment`).expect(200)).body as OwnerPayment;
const startCheckout = async (t: TestApp, token: string) => (await t.http().post(`/api/owner/${token}/payment/checkout`).expect(200)).body as { url: string };
const sessionId = (url: string) => url.split('/pay/')[1];

describe('payments: balance, online checkout against the local fake, in-shop payments and refunds', () => {
  let t: TestApp;
  let fake: PaymentFake;
  let base: string;
  beforeAll(async () => {
    ({ t, fake, base } = await appWithPaymentFake());
  }, 180_000); // the demo seed plus a second server on a shared 2-core machine
  afterAll(async () => {
    await t?.close();
    await fake?.close();
  });

  it('desk sees the balance in the jobs table and the "ready, unpaid" filter finds the job', async () => {
    const { jobId, desk } = await readyJob(t, 30);
    // 30 min × 60.00/h = 30.00 net; 20 % tax once on the net = 6.00; 36.00 due.
    const mine = await payments(desk, jobId);
    expect(mine.balance).toMatchObject({ netMinor: 3000, taxMinor: 600, grossMinor: 3600, dueMinor: 3600, state: 'unpaid', currency: 'GBP' });
    const list = (await desk.agent.get('/api/jobs?readyUnpaid=true&pageSize=100').expect(200)).body as JobPage;
    expect(list.items.find((j) => j.id === jobId)?.dueMinor).toBe(3600);
    expect(list.items.every((j) => j.status === 'ready' && (j.dueMinor ?? 0) > 0)).toBe(true);
  });

  it('creates one checkout for the exact amount with a key per job and amount; the browser return alone records nothing', async () => {
    const { jobId, desk, token } = await readyJob(t, 30);
    expect(await ownerPayment(t, token)).toMatchObject({ canPay: true, balance: { dueMinor: 3600 } });
    const first = await startCheckout(t, token);
    const again = await startCheckout(t, token);
    expect(again.url).toBe(first.url);
    const creates = fake
      .requests()
      .filter(
        (r) => r.path === '/v1/checkout/sessions' && r.method === 'POST' && (r.params as { metadata?: { jobId?: string } }).metadata?.jobId === String(jobId),
      );
    expect(creates).toHaveLength(1);
    expect(creates[0].idempotencyKey).toBe(`checkout-job-${jobId}-amount-3600-0`);
    expect(creates[0].params).toMatchObject({ line_items: [{ price_data: { unit_amount: '3600', currency: 'gbp' } }] });
    // The owner comes "back" to the success address without paying: nothing is recorded.
    const session = fake.sessions().find((s) => s.id === sessionId(first.url));
    const back = await fetch(String(session?.success_url));
    expect(back.status).toBeLessThan(500);
    expect((await payments(desk, jobId)).payments).toHaveLength(0);
    expect((await ownerPayment(t, token)).balance.dueMinor).toBe(3600);
  });

  it('records the payment only from the signed webhook, once, and queues the receipt', async () => {
    const { jobId, desk, token } = await readyJob(t, 30);
    const { url } = await startCheckout(t, token);
    await fake.pay(sessionId(url));
    const delivered = fake.events().find((e) => e.event.data.object.id === sessionId(url));
    expect(delivered?.deliveries[0].status).toBe(200);
    const after = await payments(desk, jobId);
    expect(after.balance).toMatchObject({ dueMinor: 0, paidMinor: 3600, state: 'paid' });
    expect(after.balance.paidAt).not.toBeNull();
    expect(after.payments).toMatchObject([{ kind: 'payment', method: 'online', amountMinor: 3600, flag: null }]);
    // The provider sends the same event again: still one payment, one receipt.
    const replay = await fake.resend(String(delivered?.event.id));
    expect(replay.status).toBe(200);
    expect((await payments(desk, jobId)).payments).toHaveLength(1);
    const mails = (await desk.agent.get(`/api/jobs/${jobId}/messages`).expect(200)).body as OutboxMessageDto[];
    expect(mails.filter((m) => m.kind === 'payment_receipt')).toHaveLength(1);
    expect((await ownerPayment(t, token)).canPay).toBe(false);
    const audit = (await (await t.signIn(DEMO.manager)).agent.get(`/api/audit?entityType=payment`).expect(200)).body as { action: string }[];
    expect(audit.some((a) => a.action === 'payment.received_online')).toBe(true);
  });

  it('refuses an unsigned or wrongly signed webhook with 400 and records nothing', async () => {
    const { jobId, desk, token } = await readyJob(t, 30);
    const { url } = await startCheckout(t, token);
    const event = {
      id: 'evt_forged',
      object: 'event',
      type: 'checkout.session.completed',
      data: {
        object: { id: sessionId(url), object: 'checkout.session', amount_total: 3600, currency: 'gbp', payment_status: 'paid', payment_intent: 'pi_forged' },
      },
    };
    const payload = JSON.stringify(event);
    const forged = new Stripe('sk_test_x').webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_ours' });
    const post = (headers: Record<string, string>) =>
      fetch(`${base}/api/payments/webhook`, { method: 'POST', headers: { 'content-type': 'application/json', ...headers }, body: payload });
    const wrong = await post({ 'stripe-signature': forged });
    expect(wrong.status).toBe(400);
    expect(((await wrong.json()) as { code: string }).code).toBe('WEBHOOK_SIGNATURE_INVALID');
    expect((await post({})).status).toBe(400);
    expect((await payments(desk, jobId)).payments).toHaveLength(0);
  });

  it('an online amount that no longer matches is recorded and flagged; an expired checkout leaves the balance due', async () => {
    const { jobId, desk, token } = await readyJob(t, 30);
    const expiring = await startCheckout(t, token);
    await fake.expire(sessionId(expiring.url));
    expect((await payments(desk, jobId)).balance.dueMinor).toBe(3600);
    const { url } = await startCheckout(t, token);
    expect(url).not.toBe(expiring.url);
    // Desk takes 10.00 in cash while the owner's checkout for 36.00 is open.
    await desk.agent.post(`/api/jobs/${jobId}/payments`).send({ method: 'cash', amountMinor: 1000 }).expect(201);
    await fake.pay(sessionId(url));
    const after = await payments(desk, jobId);
    const online = after.payments.find((p) => p.method === 'online');
    expect(online).toMatchObject({ amountMinor: 3600, flag: 'amount_mismatch' });
    expect(after.balance).toMatchObject({ dueMinor: -1000, state: 'overpaid' });
  });

  it('desk records part payments with who took them; a manager refunds with a reason (online through the provider)', async () => {
    const { jobId, desk, token } = await readyJob(t, 30);
    const over = await desk.agent.post(`/api/jobs/${jobId}/payments`).send({ method: 'card_terminal', amountMinor: 5000 }).expect(400);
    expect((over.body as { code: string }).code).toBe('VALIDATION_FAILED');
    await desk.agent.post(`/api/jobs/${jobId}/payments`).send({ method: 'card_terminal', amountMinor: 1600, note: 'first half' }).expect(201);
    const part = await payments(desk, jobId);
    expect(part.balance).toMatchObject({ dueMinor: 2000, state: 'part_paid' });
    expect(part.payments[0].staff?.id).toBe(desk.user.id);
    await desk.agent.post(`/api/jobs/${jobId}/payments`).send({ method: 'bank_transfer', amountMinor: 2000 }).expect(201);
    expect((await payments(desk, jobId)).balance.state).toBe('paid');
    const cardId = part.payments[0].id;
    await desk.agent.post(`/api/jobs/${jobId}/payments/${cardId}/refunds`).send({ amountMinor: 100, reason: 'Goodwill' }).expect(403);
    const manager = await t.signIn(DEMO.manager);
    await manager.agent.post(`/api/jobs/${jobId}/payments/${cardId}/refunds`).send({ amountMinor: 100 }).expect(400);
    await manager.agent.post(`/api/jobs/${jobId}/payments/${cardId}/refunds`).send({ amountMinor: 1700, reason: 'Too much' }).expect(422);
    await manager.agent.post(`/api/jobs/${jobId}/payments/${cardId}/refunds`).send({ amountMinor: 600, reason: 'Tyre lever scratch, goodwill' }).expect(201);
    const refunded = await payments(desk, jobId);
    expect(refunded.balance).toMatchObject({ refundedMinor: 600, dueMinor: 600 });
    expect(refunded.payments.find((p) => p.kind === 'refund')).toMatchObject({ note: 'Tyre lever scratch, goodwill', refundOf: cardId });
    // Online refund goes through the SDK to the fake.
    const { url } = await startCheckout(t, token);
    await fake.pay(sessionId(url));
    const online = (await payments(desk, jobId)).payments.find((p) => p.method === 'online' && p.kind === 'payment');
    await manager.agent.post(`/api/jobs/${jobId}/payments/${online?.id}/refunds`).send({ amountMinor: 250, reason: 'Paid twice by mistake' }).expect(201);
    expect(fake.refunds().some((r) => r.amount === 250)).toBe(true);
  });

  it('handing over with money due asks for a reason and records it', async () => {
    const { jobId, desk } = await readyJob(t, 30);
    const refused = await desk.agent.post(`/api/jobs/${jobId}/transitions`).send({ to: 'collected', confirmNoReport: true }).expect(409);
    expect((refused.body as { code: string }).code).toBe('UNPAID_BALANCE');
    await desk.agent
      .post(`/api/jobs/${jobId}/transitions`)
      .send({ to: 'collected', confirmNoReport: true, unpaidReason: 'Regular customer, pays at month end' })
      .expect(200);
    const events = (await desk.agent.get(`/api/jobs/${jobId}/events`).expect(200)).body as { to: string; note: string | null }[];
    expect(events.find((e) => e.to === 'collected')?.note).toContain('Regular customer, pays at month end');
  });
});
