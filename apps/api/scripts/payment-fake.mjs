#!/usr/bin/env node
// The local card-payment fake: the few calls of the provider's HTTP API that BenchProof makes
// (create and retrieve a checkout session, expire one, refund a payment), a hosted page with Pay and
// Cancel buttons, and webhooks back to the API signed with the provider's documented scheme (through
// the provider's own SDK, `webhooks.generateTestHeaderString`). `npm start` starts it on loopback
// (port 12111) when STRIPE_API_URL points there; tests import startPaymentFake({ port: 0, ... }).
// State lives in memory only. Nothing here talks to the real provider.
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:http';
import { pathToFileURL } from 'node:url';
import Stripe from 'stripe';

const esc = (s) => String(s ?? '').replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);
const newId = (prefix) => `${prefix}_fake_${randomBytes(9).toString('hex')}`;

/** Form body with bracketed keys (`line_items[0][price_data][unit_amount]=100`) → nested object, as the SDK encodes it. */
export function parseForm(body) {
  const out = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const parts = key.split(/\[|\]\[|\]/).filter((p) => p !== '');
    let node = out;
    parts.forEach((part, i) => {
      if (i === parts.length - 1) node[part] = value;
      else node = node[part] ??= /^\d+$/.test(parts[i + 1]) ? [] : {};
    });
  }
  return out;
}

const readBody = (req) =>
  new Promise((ok, fail) => {
    const chunks = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => ok(Buffer.concat(chunks).toString('utf8')));
    req.on('error', fail);
  });

const json = (res, status, body) => {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
};
const providerError = (res, status, message, type = 'invalid_request_error') => json(res, status, { error: { type, message } });
const redirect = (res, to) => {
  res.writeHead(303, { location: to });
  res.end();
};

function money(minor, currency) {
  try {
    const f = new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() });
    return f.format(minor / 10 ** (f.resolvedOptions().maximumFractionDigits ?? 2));
  } catch {
    return `${minor} ${currency}`;
  }
}

const STYLE =
  'body{font:17px/1.45 system-ui,sans-serif;margin:0;background:#eef1f4;color:#1b1f23}header{background:#3b3f8f;color:#fff;padding:12px 16px}' +
  'main{max-width:420px;margin:0 auto;padding:16px}.card{background:#fff;border-radius:10px;padding:16px;box-shadow:0 1px 3px #0002}' +
  '.amount{font-size:32px;font-weight:700;margin:8px 0 16px}button{display:block;width:100%;min-height:48px;font-size:18px;border-radius:8px;margin-top:12px;border:0;cursor:pointer}' +
  '.pay{background:#3b3f8f;color:#fff}.cancel{background:#fff;color:#3b3f8f;border:2px solid #3b3f8f}table{width:100%;border-collapse:collapse;background:#fff}td,th{padding:8px;border-bottom:1px solid #ddd;text-align:left}';
const page = (title, body) =>
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(title)}</title>` +
  `<style>${STYLE}</style></head><body><header><strong>Local card-payment fake</strong> · no real money moves</header><main>${body}</main></body></html>`;

function hostedPage(s) {
  if (s.status !== 'open') return page('Checkout', `<div class="card"><h1>This checkout is ${esc(s.status)}</h1></div>`);
  return page(
    'Checkout',
    `<div class="card"><div>${esc(s.metadata.description ?? 'Payment')}</div><div class="amount" data-testid="amount">${esc(money(s.amount_total, s.currency))}</div>` +
      `<form method="post" action="/pay/${esc(s.id)}/pay"><button class="pay" type="submit">Pay ${esc(money(s.amount_total, s.currency))}</button></form>` +
      `<form method="post" action="/pay/${esc(s.id)}/cancel"><button class="cancel" type="submit">Cancel and go back</button></form></div>`,
  );
}

const event = (type, object) => ({
  id: newId('evt'),
  object: 'event',
  type,
  created: Math.floor(Date.now() / 1000),
  data: { object },
  livemode: false,
  api_version: null,
});

/** The fake's state and behaviour; the HTTP routes below call into it. */
class FakeProvider {
  constructor(opts) {
    this.opts = opts;
    this.secret = opts.webhookSecret ?? 'whsec_local_fake';
    this.signer = new Stripe('sk_test_fake_signer', { telemetry: false });
    this.sessions = new Map();
    this.idempotent = new Map();
    this.requests = [];
    this.events = [];
    this.refunds = [];
    this.webhookUrl = opts.webhookUrl ?? null;
    this.base = '';
  }

  async deliver(ev) {
    const record = { id: ev.id, type: ev.type, status: null, error: null };
    this.events.push({ event: ev, deliveries: [record] });
    return this.webhookUrl ? this.send(ev, record) : record;
  }

  /** Signs the payload afresh (the SDK's test header: t=<time>,v1=<HMAC-SHA256>) and posts it. */
  async send(ev, record = { id: ev.id, status: null, error: null }) {
    const payload = JSON.stringify(ev);
    const header = this.signer.webhooks.generateTestHeaderString({ payload, secret: this.secret });
    try {
      const r = await fetch(this.webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
      record.status = r.status;
    } catch (e) {
      record.error = String(e);
    }
    return record;
  }

  async resend(eventId) {
    const found = this.events.find((e) => e.event.id === eventId);
    if (!found) return null;
    const rec = await this.send(found.event);
    found.deliveries.push(rec);
    return rec;
  }

  createSession(key, params) {
    if (key && this.idempotent.has(key)) {
      const prior = this.idempotent.get(key);
      if (prior.body !== JSON.stringify(params))
        return {
          status: 400,
          body: {
            error: { type: 'idempotency_error', message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.' },
          },
        };
      return { status: 200, body: this.sessions.get(prior.id) };
    }
    const item = params.line_items?.[0] ?? {};
    const unit = Number(item.price_data?.unit_amount);
    if (!Number.isInteger(unit) || unit <= 0)
      return { status: 400, body: { error: { type: 'invalid_request_error', message: 'unit_amount must be a positive integer' } } };
    const id = newId('cs');
    const session = {
      ...{ id, object: 'checkout.session', mode: params.mode ?? 'payment', status: 'open', payment_status: 'unpaid', payment_intent: null },
      ...{
        amount_total: unit * Number(item.quantity ?? 1),
        currency: (item.price_data?.currency ?? 'eur').toLowerCase(),
        client_reference_id: params.client_reference_id ?? null,
      },
      ...{
        metadata: params.metadata ?? {},
        success_url: params.success_url,
        cancel_url: params.cancel_url,
        url: `${this.base}/pay/${id}`,
        created: Math.floor(Date.now() / 1000),
      },
    };
    this.sessions.set(id, session);
    if (key) this.idempotent.set(key, { id, body: JSON.stringify(params) });
    return { status: 200, body: session };
  }

  async pay(id) {
    const s = this.sessions.get(id);
    if (!s || s.status !== 'open') return null;
    Object.assign(s, { status: 'complete', payment_status: 'paid', payment_intent: newId('pi') });
    if (this.opts.deliverWebhooks !== false) await this.deliver(event('checkout.session.completed', { ...s }));
    return s;
  }

  async expire(id) {
    const s = this.sessions.get(id);
    if (!s || s.status !== 'open') return null;
    s.status = 'expired';
    await this.deliver(event('checkout.session.expired', { ...s }));
    return s;
  }

  refund(params) {
    const s = [...this.sessions.values()].find((x) => x.payment_intent === params.payment_intent);
    if (!s) return { status: 404, body: { error: { type: 'invalid_request_error', message: `No such payment_intent: '${params.payment_intent}'` } } };
    const done = this.refunds.filter((r) => r.payment_intent === s.payment_intent).reduce((t, r) => t + r.amount, 0);
    const amount = Number(params.amount ?? s.amount_total - done);
    if (!Number.isInteger(amount) || amount <= 0 || done + amount > s.amount_total)
      return { status: 400, body: { error: { type: 'invalid_request_error', message: 'Refund amount is greater than what is left of the charge.' } } };
    const r = {
      id: newId('re'),
      object: 'refund',
      amount,
      currency: s.currency,
      payment_intent: s.payment_intent,
      status: 'succeeded',
      metadata: params.metadata ?? {},
    };
    this.refunds.push(r);
    return { status: 200, body: r };
  }
}

/** The provider's API paths the SDK calls. */
async function api(fake, req, res, url, body) {
  const params = req.method === 'POST' ? parseForm(body) : {};
  fake.requests.push({ method: req.method, path: url.pathname, idempotencyKey: req.headers['idempotency-key'] ?? null, params });
  if (!/^Bearer sk_/.test(req.headers.authorization ?? '')) return providerError(res, 401, 'Invalid API key provided.', 'authentication_error');
  let m;
  let r;
  if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') r = fake.createSession(req.headers['idempotency-key'], params);
  else if ((m = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(url.pathname)) && req.method === 'GET') {
    const s = fake.sessions.get(m[1]);
    r = s ? { status: 200, body: s } : { status: 404, body: { error: { type: 'invalid_request_error', message: `No such checkout.session: '${m[1]}'` } } };
  } else if ((m = /^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/.exec(url.pathname)) && req.method === 'POST') {
    const s = await fake.expire(m[1]);
    r = s ? { status: 200, body: s } : { status: 400, body: { error: { type: 'invalid_request_error', message: 'Only an open session can be expired.' } } };
  } else if (req.method === 'POST' && url.pathname === '/v1/refunds') r = fake.refund(params);
  else return providerError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
  return json(res, r.status, r.body);
}

function listPage(fake) {
  const rows = [...fake.sessions.values()]
    .reverse()
    .map((s) => `<tr><td><a href="/pay/${esc(s.id)}">${esc(s.id)}</a></td><td>${esc(money(s.amount_total, s.currency))}</td><td>${esc(s.status)}</td></tr>`);
  return page('Checkouts', `<h1>Checkouts (${fake.sessions.size})</h1><table><tr><th>Session</th><th>Amount</th><th>Status</th></tr>${rows.join('')}</table>`);
}

/** The hosted page, and a small JSON API for tests and the developer. */
async function site(fake, req, res, url) {
  let m;
  const html = (body) => {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    res.end(body);
  };
  if ((m = /^\/pay\/([\w-]+)$/.exec(url.pathname)) && req.method === 'GET') {
    const s = fake.sessions.get(m[1]);
    return s ? html(hostedPage(s)) : providerError(res, 404, 'No such checkout');
  }
  if ((m = /^\/pay\/([\w-]+)\/(pay|cancel)$/.exec(url.pathname)) && req.method === 'POST') {
    const s = fake.sessions.get(m[1]);
    if (!s) return providerError(res, 404, 'No such checkout');
    if (m[2] === 'cancel') return redirect(res, s.cancel_url);
    await fake.pay(s.id);
    return redirect(res, String(s.success_url).replace('{CHECKOUT_SESSION_ID}', s.id));
  }
  if ((m = /^\/api\/events\/([\w-]+)\/resend$/.exec(url.pathname)) && req.method === 'POST') {
    const rec = await fake.resend(m[1]);
    return rec ? json(res, 200, rec) : providerError(res, 404, 'No such event');
  }
  const lists = { '/api/sessions': () => [...fake.sessions.values()], '/api/requests': () => fake.requests, '/api/events': () => fake.events };
  if (lists[url.pathname]) return json(res, 200, lists[url.pathname]());
  if (url.pathname === '/') return html(listPage(fake));
  return providerError(res, 404, 'Not found');
}

/**
 * Starts the fake. Port 0 picks a free port. `webhookUrl` is where signed events go (the API's
 * /api/payments/webhook); `webhookSecret` signs them (the API's STRIPE_WEBHOOK_SECRET).
 */
export async function startPaymentFake(opts = {}) {
  const host = opts.host ?? '127.0.0.1';
  const fake = new FakeProvider(opts);
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', fake.base || 'http://localhost');
    readBody(req)
      .then((body) => (url.pathname.startsWith('/v1/') ? api(fake, req, res, url, body) : site(fake, req, res, url)))
      .catch((e) => providerError(res, 500, String(e), 'api_error'));
  });
  const port = await new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(opts.port ?? 12111, host, () => ok(server.address().port));
  });
  fake.base = `http://${host}:${port}`;
  return {
    ...{
      port,
      url: fake.base,
      sessions: () => [...fake.sessions.values()],
      requests: () => fake.requests,
      events: () => fake.events,
      refunds: () => fake.refunds,
    },
    setWebhookUrl: (u) => void (fake.webhookUrl = u),
    pay: (id) => fake.pay(id),
    expire: (id) => fake.expire(id),
    /** Sends an already delivered event again, signed afresh (a provider retry). */
    resend: (eventId) => fake.resend(eventId),
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const fake = await startPaymentFake({
    port: Number(process.env.PAYMENT_FAKE_PORT ?? 12111),
    webhookUrl: process.env.PAYMENT_FAKE_WEBHOOK_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}/api/payments/webhook`,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_local_fake',
  });
  console.log(`[payments] Local card-payment fake on ${fake.url} (checkouts listed there)`);
  const stop = () => void fake.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
