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

/**
 * Starts the fake. Port 0 picks a free port. `webhookUrl` is where signed events go (the API's
 * /api/payments/webhook); `webhookSecret` signs them (the API's STRIPE_WEBHOOK_SECRET).
 */
export async function startPaymentFake(opts = {}) {
  const host = opts.host ?? '127.0.0.1';
  const signer = new Stripe('sk_test_fake_signer', { telemetry: false });
  const state = { sessions: new Map(), idempotent: new Map(), requests: [], events: [], refunds: [], webhookUrl: opts.webhookUrl ?? null };
  const secret = opts.webhookSecret ?? 'whsec_local_fake';
  let base = '';

  async function deliver(event) {
    const payload = JSON.stringify(event);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret });
    const record = { id: event.id, type: event.type, status: null, error: null };
    state.events.push({ event, deliveries: [record] });
    if (!state.webhookUrl) return record;
    return send(event, payload, header, record);
  }

  async function send(event, payload, header, record) {
    try {
      const r = await fetch(state.webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
      record.status = r.status;
    } catch (e) {
      record.error = String(e);
    }
    return record;
  }

  const event = (type, object) => ({ id: newId('evt'), object: 'event', type, created: Math.floor(Date.now() / 1000), data: { object }, livemode: false, api_version: null });

  function createSession(req, params) {
    const key = req.headers['idempotency-key'];
    if (key && state.idempotent.has(key)) {
      const prior = state.idempotent.get(key);
      if (prior.body !== JSON.stringify(params)) return { status: 400, body: { error: { type: 'idempotency_error', message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.' } } };
      return { status: 200, body: state.sessions.get(prior.id) };
    }
    const item = params.line_items?.[0] ?? {};
    const quantity = Number(item.quantity ?? 1);
    const unit = Number(item.price_data?.unit_amount);
    if (!Number.isInteger(unit) || unit <= 0) return { status: 400, body: { error: { type: 'invalid_request_error', message: 'unit_amount must be a positive integer' } } };
    const id = newId('cs');
    const session = {
      ...{ id, object: 'checkout.session', mode: params.mode ?? 'payment', status: 'open', payment_status: 'unpaid', payment_intent: null },
      ...{ amount_total: unit * quantity, currency: (item.price_data?.currency ?? 'eur').toLowerCase(), client_reference_id: params.client_reference_id ?? null },
      ...{ metadata: params.metadata ?? {}, success_url: params.success_url, cancel_url: params.cancel_url, url: `${base}/pay/${id}`, created: Math.floor(Date.now() / 1000) },
    };
    state.sessions.set(id, session);
    if (key) state.idempotent.set(key, { id, body: JSON.stringify(params) });
    return { status: 200, body: session };
  }

  async function pay(id) {
    const s = state.sessions.get(id);
    if (!s || s.status !== 'open') return null;
    Object.assign(s, { status: 'complete', payment_status: 'paid', payment_intent: newId('pi') });
    if (opts.deliverWebhooks !== false) await deliver(event('checkout.session.completed', { ...s }));
    return s;
  }

  async function expire(id) {
    const s = state.sessions.get(id);
    if (!s || s.status !== 'open') return null;
    s.status = 'expired';
    await deliver(event('checkout.session.expired', { ...s }));
    return s;
  }

  function refund(params, res) {
    const s = [...state.sessions.values()].find((x) => x.payment_intent === params.payment_intent);
    if (!s) return providerError(res, 404, `No such payment_intent: '${params.payment_intent}'`);
    const done = state.refunds.filter((r) => r.payment_intent === s.payment_intent).reduce((t, r) => t + r.amount, 0);
    const amount = Number(params.amount ?? s.amount_total - done);
    if (!Number.isInteger(amount) || amount <= 0 || done + amount > s.amount_total) return providerError(res, 400, 'Refund amount is greater than what is left of the charge.');
    const r = { id: newId('re'), object: 'refund', amount, currency: s.currency, payment_intent: s.payment_intent, status: 'succeeded', metadata: params.metadata ?? {} };
    state.refunds.push(r);
    return json(res, 200, r);
  }

  async function api(req, res, url, body) {
    const params = req.method === 'POST' ? parseForm(body) : {};
    state.requests.push({ method: req.method, path: url.pathname, idempotencyKey: req.headers['idempotency-key'] ?? null, params });
    if (!/^Bearer sk_/.test(req.headers.authorization ?? '')) return providerError(res, 401, 'Invalid API key provided.', 'authentication_error');
    let m;
    if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
      const r = createSession(req, params);
      return json(res, r.status, r.body);
    }
    if ((m = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(url.pathname)) && req.method === 'GET') {
      const s = state.sessions.get(m[1]);
      return s ? json(res, 200, s) : providerError(res, 404, `No such checkout.session: '${m[1]}'`);
    }
    if ((m = /^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/.exec(url.pathname)) && req.method === 'POST') {
      const s = await expire(m[1]);
      return s ? json(res, 200, s) : providerError(res, 400, 'Only an open session can be expired.');
    }
    if (req.method === 'POST' && url.pathname === '/v1/refunds') return refund(params, res);
    return providerError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
  }

  /** The hosted page, and a small JSON API for tests and the developer. */
  async function site(req, res, url) {
    let m;
    if ((m = /^\/pay\/([\w-]+)$/.exec(url.pathname)) && req.method === 'GET') {
      const s = state.sessions.get(m[1]);
      if (!s) return providerError(res, 404, 'No such checkout');
      res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
      return res.end(hostedPage(s));
    }
    if ((m = /^\/pay\/([\w-]+)\/(pay|cancel)$/.exec(url.pathname)) && req.method === 'POST') {
      const s = state.sessions.get(m[1]);
      if (!s) return providerError(res, 404, 'No such checkout');
      if (m[2] === 'cancel') return redirect(res, s.cancel_url);
      await pay(s.id);
      return redirect(res, String(s.success_url).replace('{CHECKOUT_SESSION_ID}', s.id));
    }
    if (url.pathname === '/api/sessions') return json(res, 200, [...state.sessions.values()]);
    if (url.pathname === '/api/requests') return json(res, 200, state.requests);
    if (url.pathname === '/api/events') return json(res, 200, state.events);
    if ((m = /^\/api\/events\/([\w-]+)\/resend$/.exec(url.pathname)) && req.method === 'POST') {
      const found = state.events.find((e) => e.event.id === m[1]);
      if (!found) return providerError(res, 404, 'No such event');
      const payload = JSON.stringify(found.event);
      const rec = await send(found.event, payload, signer.webhooks.generateTestHeaderString({ payload, secret }), { id: found.event.id, status: null, error: null });
      found.deliveries.push(rec);
      return json(res, 200, rec);
    }
    if (url.pathname === '/') {
      const rows = [...state.sessions.values()].reverse().map((s) => `<tr><td><a href="/pay/${esc(s.id)}">${esc(s.id)}</a></td><td>${esc(money(s.amount_total, s.currency))}</td><td>${esc(s.status)}</td></tr>`);
      res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
      return res.end(page('Checkouts', `<h1>Checkouts (${state.sessions.size})</h1><table><tr><th>Session</th><th>Amount</th><th>Status</th></tr>${rows.join('')}</table>`));
    }
    return providerError(res, 404, 'Not found');
  }

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', base);
    readBody(req)
      .then((body) => (url.pathname.startsWith('/v1/') ? api(req, res, url, body) : site(req, res, url)))
      .catch((e) => providerError(res, 500, String(e), 'api_error'));
  });
  const port = await new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(opts.port ?? 12111, host, () => ok(server.address().port));
  });
  base = `http://${host}:${port}`;
  return {
    port,
    url: base,
    sessions: () => [...state.sessions.values()],
    requests: () => state.requests,
    events: () => state.events,
    refunds: () => state.refunds,
    setWebhookUrl: (u) => void (state.webhookUrl = u),
    pay,
    expire,
    /** Sends an already delivered event again, signed afresh (a provider retry). */
    resend: async (eventId) => {
      const found = state.events.find((e) => e.event.id === eventId);
      const payload = JSON.stringify(found.event);
      return send(found.event, payload, signer.webhooks.generateTestHeaderString({ payload, secret }), { id: eventId, status: null, error: null });
    },
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
