import { FINAL_CHECK_ITEMS } from '@benchproof/domain';
import type { AddressInfo } from 'node:net';
import { startPaymentFake } from '../../scripts/payment-fake.mjs';
import { createLink } from '../e2e/owner-helpers';
import { bookIn } from '../e2e/records-helpers';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

export type PaymentFake = Awaited<ReturnType<typeof startPaymentFake>>;

/** The fake on a free port, the app pointed at it (SDK host/port/protocol), and the fake's webhooks pointed back. */
export async function appWithPaymentFake(env: Record<string, string> = {}): Promise<{ t: TestApp; fake: PaymentFake; base: string }> {
  const fake = await startPaymentFake({ port: 0, webhookSecret: 'whsec_test_secret' });
  const t = await startTestApp({ STRIPE_API_URL: fake.url, STRIPE_WEBHOOK_SECRET: 'whsec_test_secret', STRIPE_SECRET_KEY: 'sk_test_e2e', ...env });
  await t.app.listen(0, '127.0.0.1');
  const base = `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`;
  fake.setWebhookUrl(`${base}/api/payments/webhook`);
  return { t, fake, base };
}

/**
 * A job taken to ready through the API, with `minutes` of chargeable bench time: at the demo
 * shop's 60.00/h and 20 % tax, 30 min = 30.00 net + 6.00 tax = 36.00 due.
 */
export async function readyJob(t: TestApp, minutes = 30): Promise<{ jobId: number; desk: SignedIn; token: string }> {
  const desk = await t.signIn(DEMO.desk);
  const mech = await t.signIn(DEMO.mechanic);
  const checker = await t.signIn(DEMO.mechanic2);
  const job = await bookIn(desk, { mechanicId: mech.user.id });
  const j = `/api/jobs/${job.id}`;
  for (const to of ['on_stand', 'in_work']) await desk.agent.post(`${j}/transitions`).send({ to }).expect(200);
  await mech.agent.post(`${j}/work-entries`).send({ description: 'Cleaned and adjusted the drivetrain', minutes, chargeable: true }).expect(201);
  await desk.agent.post(`${j}/transitions`).send({ to: 'final_check' }).expect(200);
  const items = Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, true]));
  await checker.agent.post(`${j}/final-check`).send({ items, passed: true, testRideNotes: null, note: null }).expect(201);
  await desk.agent.post(`${j}/transitions`).send({ to: 'ready' }).expect(200);
  const link = await createLink(desk, job.id);
  return { jobId: job.id, desk, token: link.token };
}
