import type { CustomerDto, TextMessageDto } from '@benchproof/contracts';
import { createServer } from 'node:net';
import { startTextFake } from '../../scripts/text-fake.mjs';
import { eventually } from '../mail/mail-fixtures';
import { bookIn } from '../e2e/records-helpers';
import { startTestApp, type SignedIn, type TestApp } from '../test-app';

export type TextFake = Awaited<ReturnType<typeof startTextFake>>;
export const TEXT_AUTH = { TWILIO_ACCOUNT_SID: `AC${'5'.repeat(32)}`, TWILIO_AUTH_TOKEN: 'e2e_text_auth_token' };

/** A port that was free a moment ago: the app's PUBLIC_URL must name it before the app starts (signed callback URLs). */
const freePort = (): Promise<number> =>
  new Promise((ok, fail) => {
    const s = createServer();
    s.once('error', fail);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => ok(port));
    });
  });

/** The fake on a free port, the app's SDK pointed at it (custom httpClient), listening where its PUBLIC_URL says. */
export async function appWithTextFake(env: Record<string, string> = {}): Promise<{ t: TestApp; fake: TextFake; base: string }> {
  const fake = await startTextFake({ port: 0, accountSid: TEXT_AUTH.TWILIO_ACCOUNT_SID, authToken: TEXT_AUTH.TWILIO_AUTH_TOKEN, callbackDelayMs: 20 });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const t = await startTestApp({ ...TEXT_AUTH, TWILIO_API_URL: fake.url, PUBLIC_URL: base, TEXT_RETRY_BASE_MS: '200', TEXT_MAX_ATTEMPTS: '3', ...env });
  await t.app.listen(port, '127.0.0.1');
  fake.setInboundUrl(`${base}/api/texts/inbound`);
  return { t, fake, base };
}

/** A job booked in for a new customer who prefers texts, with the number as desk typed it. */
export async function jobForTexter(
  desk: SignedIn,
  phone: string,
  name = 'Tamsin Orrell',
  more: Record<string, unknown> = {},
): Promise<{ jobId: number; customer: CustomerDto }> {
  const job = await bookIn(desk, { newCustomer: { name, email: null, phone, preferredChannel: 'sms', notes: null }, ...more });
  const customer = (await desk.agent.get(`/api/customers/${job.customer.id}`).expect(200)).body as CustomerDto;
  return { jobId: job.id, customer };
}

export const jobTexts = async (s: SignedIn, jobId: number) => (await s.agent.get(`/api/jobs/${jobId}/texts`).expect(200)).body as TextMessageDto[];

/** Waits until the job's newest text reaches `status`. */
export const textReaches = (s: SignedIn, jobId: number, status: TextMessageDto['status']) =>
  eventually(async () => (await jobTexts(s, jobId)).find((m) => m.status === status), `a text of job ${jobId} to be ${status}`);

/** `eventually` for a check that needs no request (the fake's own lists). */
export const until = <T>(check: () => T | undefined, what: string): Promise<T> => eventually(() => Promise.resolve(check()), what);
