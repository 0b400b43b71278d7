import type { CreatedOwnerLinkDto, CustomerDto, OutboxMessageDto } from '@benchproof/contracts';
import { FINAL_CHECK_ITEMS } from '@benchproof/domain';
import { sql } from 'drizzle-orm';
import { existsSync, readFileSync } from 'node:fs';
import { signRequest } from '../../scripts/text-fake.mjs';
import { DB, type Db } from '../../src/core/db';
import { appWithTextFake, jobForTexter, jobTexts, TEXT_AUTH, textReaches, until, type TextFake } from '../texts/text-fixtures';
import { eventually } from '../mail/mail-fixtures';
import { DEMO, type SignedIn, type TestApp } from '../test-app';

const sendLink = async (desk: SignedIn, jobId: number) =>
  (await desk.agent.post(`/api/jobs/${jobId}/owner-links`).send({ expiresInDays: 7, send: true }).expect(201)).body as CreatedOwnerLinkDto;
const textsTo = (fake: TextFake, to: string) => fake.messages().filter((m) => m.to === to);

describe('texts: owners who prefer texts get links by text through the provider SDK and its local fake', () => {
  let t: TestApp;
  let fake: TextFake;
  let base: string;
  let desk: SignedIn;
  beforeAll(async () => {
    ({ t, fake, base } = await appWithTextFake());
    desk = await t.signIn(DEMO.desk);
  }, 180_000); // the demo seed on a shared 2-core machine
  afterAll(async () => {
    await t?.close();
    await fake?.close();
  });

  it('texts the owner link to a customer who prefers texts; the link opens the owner page; desk sees it delivered', async () => {
    // Typed the national way; the demo shop is in GB, so it is read as +44 (Ofcom's drama range for London, from memory).
    const { jobId, customer } = await jobForTexter(desk, '020 7946 0321');
    expect(customer.phone).toBe('+442079460321');
    const created = await sendLink(desk, jobId);
    expect(created.mail).toEqual({ status: 'queued', reason: null, channel: 'sms' });
    const [text] = await until(() => (textsTo(fake, '+442079460321').length ? textsTo(fake, '+442079460321') : undefined), 'the text');
    // The shop's name, one sentence and the link; nothing else.
    expect(text.body).toBe(`Lantern & Spoke Workshop: your bike's service page: ${created.url}`);
    expect(created.url.startsWith(`${base}/o/`)).toBe(true);
    const token = created.url.split('/o/')[1];
    await t.http().get(`/api/owner/${token}`).expect(200);
    // The fake's signed status callbacks reach the API, which checks them with the SDK's validateRequest.
    const delivered = await textReaches(desk, jobId, 'delivered');
    expect(delivered).toMatchObject({ kind: 'owner_link', to: '+442079460321', attempts: 1, lastError: null });
    expect(delivered.body).not.toContain(token); // the stored row drops the link once the provider has it
    const answered = await until(() => {
      const mine = fake.callbacks().filter((c) => c.params.To === '+442079460321');
      return mine.length === 2 && mine.every((c) => c.status !== null) ? mine : undefined;
    }, 'both status callbacks answered');
    expect(answered.map((c) => [c.params.MessageStatus, c.status])).toEqual([
      ['sent', 200],
      ['delivered', 200],
    ]);
    // Texted, not e-mailed.
    const mails = (await desk.agent.get(`/api/jobs/${jobId}/messages`).expect(200)).body as OutboxMessageDto[];
    expect(mails).toHaveLength(0);
  });

  it('texts "ready to collect" in the move to ready, and "needs a decision" for a link sent while the job waits on the owner', async () => {
    const mech = await t.signIn(DEMO.mechanic);
    const checker = await t.signIn(DEMO.mechanic2);
    // An Australian mobile number set aside for fiction (ACMA, from memory), typed with its country code.
    const { jobId } = await jobForTexter(desk, '+61 491 570 157', 'Orla Venn', { mechanicId: mech.user.id });
    for (const to of ['on_stand', 'waiting_owner']) await desk.agent.post(`/api/jobs/${jobId}/transitions`).send({ to }).expect(200);
    const created = await sendLink(desk, jobId);
    await until(() => textsTo(fake, '+61491570157')[0], 'the decision text');
    expect(textsTo(fake, '+61491570157')[0].body).toBe(`Lantern & Spoke Workshop: your estimate needs a decision: ${created.url}`);
    const j = `/api/jobs/${jobId}`;
    for (const to of ['in_work', 'final_check']) await desk.agent.post(`${j}/transitions`).send({ to }).expect(200);
    const items = Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, true]));
    await checker.agent.post(`${j}/final-check`).send({ items, passed: true, testRideNotes: null, note: null }).expect(201);
    expect(textsTo(fake, '+61491570157')).toHaveLength(1); // nothing on the way to ready
    await desk.agent.post(`${j}/transitions`).send({ to: 'ready' }).expect(200);
    await until(() => textsTo(fake, '+61491570157')[1], 'the ready text');
    // The job had a live link: the ready text carries a fresh one (only a link's hash is kept), and the earlier one stops working.
    const ready = /^Lantern & Spoke Workshop: your bike is ready to collect: (http\S+\/o\/(\S+))$/.exec(textsTo(fake, '+61491570157')[1].body);
    expect(ready).not.toBeNull();
    expect(ready![1]).not.toBe(created.url);
    await t.http().get(`/api/owner/${ready![2]}`).expect(200);
    expect(
      (
        await t
          .http()
          .get(`/api/owner/${created.url.split('/o/')[1]}`)
          .expect(410)
      ).body.code,
    ).toBe('OWNER_LINK_REVOKED');
    const texts = await jobTexts(desk, jobId);
    expect(texts.map((m) => m.kind)).toEqual(['ready_to_collect', 'estimate_decision']);
  });

  it('retries a send the provider refused for a moment and shows the attempts; a refusal for good is shown as failed', async () => {
    const { jobId } = await jobForTexter(desk, '020 7946 0322');
    fake.failNext(1, 503, 20503, 'Service Unavailable');
    await sendLink(desk, jobId);
    const delivered = await textReaches(desk, jobId, 'delivered');
    expect(delivered.attempts).toBe(2);
    expect(fake.requests().filter((r) => r.params.To === '+442079460322')).toHaveLength(2);
    expect(textsTo(fake, '+442079460322')).toHaveLength(1);

    const second = await jobForTexter(desk, '020 7946 0323', 'Ines Farrow');
    fake.failNext(1, 400, 21610, 'Attempt to send to unsubscribed recipient');
    await sendLink(desk, second.jobId);
    const failed = await textReaches(desk, second.jobId, 'failed');
    expect(failed).toMatchObject({ attempts: 1, maxAttempts: 3 });
    expect(failed.lastError).toContain('unsubscribed recipient');
    expect(textsTo(fake, '+442079460323')).toHaveLength(0);
  });

  it('a queued text keeps the link sealed (no row, no database or WAL byte holds it); the text that arrives has a working link', async () => {
    const { jobId } = await jobForTexter(desk, '020 7946 0327');
    fake.failNext(2, 503, 20503, 'Service Unavailable'); // two refused attempts keep the text queued a while
    const created = await sendLink(desk, jobId);
    const token = created.url.split('/o/')[1];
    const secret = token.split('.')[0];
    // While the provider refuses, the text waits in the queue: its row holds a placeholder and the sealed link only.
    const waiting = await eventually(async () => (await jobTexts(desk, jobId)).find((m) => m.attempts >= 1), 'a refused first attempt');
    expect(['queued', 'sending']).toContain(waiting.status);
    const db = t.app.get<Db>(DB);
    const tables = db.all<{ name: string }>(sql`SELECT name FROM sqlite_master WHERE type = 'table'`).map((r) => r.name);
    const rowsWith = (needle: string) => tables.filter((name) => db.all(sql.raw(`SELECT * FROM "${name}"`)).some((r) => JSON.stringify(r).includes(needle)));
    const filesWith = (needle: string) =>
      ['', '-wal'].map((x) => `${t.cfg.DATABASE_PATH}${x}`).filter((f) => existsSync(f) && readFileSync(f).includes(needle));
    expect(rowsWith(secret)).toEqual([]);
    expect(filesWith(secret)).toEqual([]);
    const row = db.get<{ body: string; sealed_secrets: string | null }>(sql`SELECT body, sealed_secrets FROM text_messages WHERE id = ${waiting.id}`);
    expect(row?.body).not.toContain('/o/');
    expect(row?.sealed_secrets).toMatch(/^v1\./);
    // The provider gets the whole link at send; it opens the owner page; the sealed copy is gone once it was accepted.
    const [text] = await until(() => textsTo(fake, '+442079460327')[0] && textsTo(fake, '+442079460327'), 'the text');
    expect(text.body).toBe(`Lantern & Spoke Workshop: your bike's service page: ${created.url}`);
    await t.http().get(`/api/owner/${token}`).expect(200);
    expect((await textReaches(desk, jobId, 'delivered')).attempts).toBe(3);
    const after = db.get<{ sealed_secrets: string | null }>(sql`SELECT sealed_secrets FROM text_messages WHERE id = ${waiting.id}`);
    expect(after?.sealed_secrets).toBeNull();
    expect(rowsWith(secret)).toEqual([]);
    expect(filesWith(secret)).toEqual([]);
  });

  it('a STOP reply records the opt-out and no further text goes to that owner', async () => {
    const { jobId, customer } = await jobForTexter(desk, '020 7946 0324');
    await sendLink(desk, jobId);
    await textReaches(desk, jobId, 'delivered');
    expect(((await desk.agent.get(`/api/customers/${customer.id}`).expect(200)).body as CustomerDto).textsStoppedAt).toBeNull();
    const reply = await fake.reply('+442079460324', 'Stop');
    expect(reply.status).toBe(200);
    // Desk sees on the customer that (and when) they replied STOP, and the text that went before it.
    const stopped = (await desk.agent.get(`/api/customers/${customer.id}`).expect(200)).body as CustomerDto;
    expect(Date.parse(stopped.textsStoppedAt ?? '')).toBeGreaterThan(Date.now() - 60_000);
    const customerTexts = (await desk.agent.get(`/api/customers/${customer.id}/texts`).expect(200)).body as { jobId: number; status: string }[];
    expect(customerTexts).toMatchObject([{ jobId, status: 'delivered' }]);
    const again = await sendLink(desk, jobId);
    expect(again.mail).toEqual({ status: 'not_sent', reason: 'The owner replied STOP and gets no more texts.', channel: null });
    for (const to of ['on_stand', 'in_work']) await desk.agent.post(`/api/jobs/${jobId}/transitions`).send({ to }).expect(200);
    expect(textsTo(fake, '+442079460324')).toHaveLength(1);
    expect(await jobTexts(desk, jobId)).toHaveLength(1);
    const manager = await t.signIn(DEMO.manager);
    const audit = (await manager.agent.get(`/api/audit?entityType=customer`).expect(200)).body as { action: string; entityId: number }[];
    expect(audit.some((a) => a.action === 'customer.texts_stopped' && a.entityId === customer.id)).toBe(true);
  });

  it('refuses a number that is not a phone number at entry, with a clear message under the field, and stores nothing', async () => {
    const before = (await desk.agent.get('/api/customers?q=Ulla').expect(200)).body as { total: number };
    const res = await desk.agent
      .post('/api/customers')
      .send({ name: 'Ulla Brenning', email: null, phone: '020 7946', preferredChannel: 'sms', notes: null })
      .expect(422);
    expect(res.body).toMatchObject({ code: 'PHONE_INVALID', details: { field: 'phone', country: 'GB' } });
    expect(res.body.message).toMatch(/not a valid phone number/);
    const after = (await desk.agent.get('/api/customers?q=Ulla').expect(200)).body as { total: number };
    expect(after.total).toBe(before.total);
    const { customer } = await jobForTexter(desk, '020 7946 0325', 'Ulla Brenning');
    const patch = { name: customer.name, email: null, phone: '+44 20 7946', preferredChannel: 'sms', notes: null };
    expect((await desk.agent.patch(`/api/customers/${customer.id}`).send(patch).expect(422)).body.code).toBe('PHONE_INVALID');
    expect(((await desk.agent.get(`/api/customers/${customer.id}`).expect(200)).body as CustomerDto).phone).toBe('+442079460325');
  });

  it('refuses a status callback or a reply with a bad signature (400) and changes nothing', async () => {
    const { jobId } = await jobForTexter(desk, '020 7946 0326');
    await sendLink(desk, jobId);
    const text = await textReaches(desk, jobId, 'delivered');
    const sid = textsTo(fake, '+442079460326')[0].sid;
    const url = `${base}/api/texts/status?shop=${desk.user.shopId}&text=${text.id}`;
    const params = { AccountSid: TEXT_AUTH.TWILIO_ACCOUNT_SID, MessageSid: sid, MessageStatus: 'undelivered', To: '+442079460326' };
    const forged = signRequest('not_the_auth_token', url, params);
    for (const signature of [forged, undefined]) {
      const req = t.http().post(`/api/texts/status?shop=${desk.user.shopId}&text=${text.id}`).type('form').send(params);
      const res = await (signature ? req.set('x-twilio-signature', signature) : req);
      expect(res.status).toBe(400);
      expect(res.body.code).toBe('WEBHOOK_SIGNATURE_INVALID');
    }
    // Signed over other params than those sent (a changed status): refused too.
    const tampered = signRequest(TEXT_AUTH.TWILIO_AUTH_TOKEN, url, { ...params, MessageStatus: 'delivered' });
    await t.http().post(`/api/texts/status?shop=${desk.user.shopId}&text=${text.id}`).type('form').set('x-twilio-signature', tampered).send(params).expect(400);
    expect((await jobTexts(desk, jobId))[0].status).toBe('delivered');
    const stop = { AccountSid: TEXT_AUTH.TWILIO_ACCOUNT_SID, Body: 'STOP', From: '+442079460326', To: '+15005550006' };
    await t.http().post('/api/texts/inbound').type('form').set('x-twilio-signature', forged).send(stop).expect(400);
    await sendLink(desk, jobId);
    await until(() => (textsTo(fake, '+442079460326').length === 2 ? true : undefined), 'a second text (no opt-out recorded)');
  });
});
