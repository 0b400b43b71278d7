#!/usr/bin/env node
// The local text-message fake: the one call of the provider's REST API that BenchProof makes (create a
// message), an inbox page listing what was "sent", delivery-status callbacks and inbound replies posted
// back to the API signed the way the provider documents its webhooks (X-Twilio-Signature: HMAC-SHA1
// keyed with the auth token over the full URL followed by each POST parameter name and value, sorted by
// name, base64). The signature is computed here by hand so the API's check (the SDK's validateRequest)
// is tested against an independent implementation. `npm start` starts it on loopback (port 12112) when
// TWILIO_API_URL points there; tests import startTextFake({ port: 0, ... }). State lives in memory only.
import { createHmac, randomBytes } from 'node:crypto';
import { createServer } from 'node:http';
import { pathToFileURL } from 'node:url';

const esc = (s) => String(s ?? '').replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);
const newSid = (prefix) => `${prefix}${randomBytes(16).toString('hex')}`;
const E164 = /^\+[1-9]\d{6,14}$/;

/** The provider's documented request signature: base64(HMAC-SHA1(authToken, url + sorted name/value pairs)). */
export function signRequest(authToken, url, params) {
  const data = Object.keys(params)
    .sort()
    .reduce((acc, k) => acc + k + params[k], url);
  return createHmac('sha1', authToken).update(Buffer.from(data, 'utf8')).digest('base64');
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
/** The provider's error body: numeric code, message, HTTP status. */
const providerError = (res, status, code, message) => json(res, status, { code, message, more_info: '', status });

const STYLE =
  'body{font:17px/1.45 system-ui,sans-serif;margin:0;background:#eef1f4;color:#1b1f23}header{background:#2f6f4f;color:#fff;padding:12px 16px}' +
  'main{max-width:640px;margin:0 auto;padding:16px}.msg{background:#fff;border-radius:10px;padding:12px 16px;margin-bottom:12px;box-shadow:0 1px 3px #0002}' +
  '.meta{color:#555;font-size:14px}.body{white-space:pre-wrap;word-break:break-word;margin:8px 0}button,input{font-size:16px;min-height:44px}';
const page = (title, body) =>
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(title)}</title>` +
  `<style>${STYLE}</style></head><body><header><strong>Local text inbox</strong> · nothing leaves this machine</header><main>${body}</main></body></html>`;

const linkify = (text) => esc(text).replace(/https?:\/\/[^\s<]+/g, (u) => `<a href="${u}">${u}</a>`);

function inboxPage(fake) {
  const cards = [...fake.messages]
    .reverse()
    .map(
      (m) =>
        `<div class="msg" data-testid="text"><div class="meta">To <strong>${esc(m.to)}</strong> from ${esc(m.from)} · ${esc(m.date_created)} · ${esc(m.status)}</div>` +
        `<div class="body">${linkify(m.body)}</div>` +
        `<form method="post" action="/reply"><input type="hidden" name="from" value="${esc(m.to)}"><input name="body" value="STOP" aria-label="Reply">` +
        ` <button type="submit">Reply as the owner</button></form></div>`,
    );
  return page('Texts', `<h1>Texts (${fake.messages.length})</h1>${cards.join('') || '<p>No texts yet.</p>'}`);
}

/** The fake's state and behaviour; the HTTP routes below call into it. */
class FakeTexts {
  constructor(opts) {
    this.accountSid = opts.accountSid ?? 'AC00000000000000000000000000000000';
    this.authToken = opts.authToken ?? 'local_fake_auth_token';
    this.inboundUrl = opts.inboundUrl ?? null;
    this.callbackDelayMs = opts.callbackDelayMs ?? 50;
    this.messages = [];
    this.requests = [];
    this.callbacks = [];
    this.inbound = [];
    /** Answers queued for the next message-create calls (a test makes sends fail). */
    this.failures = [];
  }

  /** Posts form params to `url`, signed with the auth token; records the answer. */
  async post(url, params, log) {
    const record = { url, params, status: null, error: null };
    log.push(record);
    try {
      const r = await fetch(url, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-twilio-signature': signRequest(this.authToken, url, params) },
        body: new URLSearchParams(params).toString(),
      });
      record.status = r.status;
    } catch (e) {
      record.error = String(e);
    }
    return record;
  }

  create(params) {
    const failure = this.failures.shift();
    if (failure) return { status: failure.status, body: { code: failure.code, message: failure.message, more_info: '', status: failure.status } };
    if (!E164.test(params.To ?? ''))
      return { status: 400, body: { code: 21211, message: `The 'To' number ${params.To} is not a valid phone number.`, status: 400 } };
    if (!params.Body) return { status: 400, body: { code: 21602, message: 'Message body is required.', status: 400 } };
    const now = new Date().toUTCString();
    const m = {
      ...{ sid: newSid('SM'), account_sid: this.accountSid, to: params.To, from: params.From ?? params.MessagingServiceSid, body: params.Body },
      ...{ status: 'queued', direction: 'outbound-api', num_segments: '1', date_created: now, date_updated: now, date_sent: null },
      ...{ error_code: null, error_message: null, price: null, api_version: '2010-04-01', uri: `/2010-04-01/Accounts/${this.accountSid}/Messages/` },
      status_callback: params.StatusCallback ?? null,
    };
    m.uri += `${m.sid}.json`;
    this.messages.push(m);
    if (m.status_callback) setTimeout(() => void this.progress(m), this.callbackDelayMs);
    return { status: 201, body: m };
  }

  /** queued → sent → delivered, each step a signed status callback (awaited one after the other). */
  async progress(m) {
    for (const status of ['sent', 'delivered']) {
      m.status = status;
      await this.statusCallback(m);
    }
  }

  statusCallback(m, status = m.status) {
    const params = {
      AccountSid: this.accountSid,
      ApiVersion: '2010-04-01',
      From: m.from,
      MessageSid: m.sid,
      MessageStatus: status,
      SmsSid: m.sid,
      SmsStatus: status,
      To: m.to,
    };
    return this.post(m.status_callback, params, this.callbacks);
  }

  /** The owner's reply: a signed inbound-message webhook to the API. */
  reply(from, body) {
    if (!this.inboundUrl) return Promise.resolve({ url: null, status: null, error: 'no inbound URL set' });
    const to = this.messages.filter((m) => m.to === from).at(-1)?.from ?? '+15005550006';
    const params = { AccountSid: this.accountSid, ApiVersion: '2010-04-01', Body: body, From: from, MessageSid: newSid('SM'), NumMedia: '0', To: to };
    return this.post(this.inboundUrl, params, this.inbound);
  }
}

const basicAuthOk = (fake, header) => {
  const [scheme, value] = String(header ?? '').split(' ');
  if (scheme !== 'Basic' || !value) return false;
  const [user, pass] = Buffer.from(value, 'base64').toString('utf8').split(':');
  return user === fake.accountSid && pass === fake.authToken;
};

/** The provider's API path the SDK calls: POST /2010-04-01/Accounts/{sid}/Messages.json. */
function api(fake, req, res, url, body) {
  const params = Object.fromEntries(new URLSearchParams(body));
  fake.requests.push({ method: req.method, path: url.pathname, params });
  if (!basicAuthOk(fake, req.headers.authorization)) return providerError(res, 401, 20003, 'Authenticate');
  const m = /^\/2010-04-01\/Accounts\/(\w+)\/Messages\.json$/.exec(url.pathname);
  if (!m || req.method !== 'POST') return providerError(res, 404, 20404, `The requested resource ${url.pathname} was not found`);
  if (m[1] !== fake.accountSid) return providerError(res, 403, 20003, 'Account does not match the credentials');
  const r = fake.create(params);
  return json(res, r.status, r.body);
}

/** The inbox page and a small JSON API for tests and the developer. */
async function site(fake, req, res, url, body) {
  const html = (status, b) => {
    res.writeHead(status, { 'content-type': 'text/html; charset=utf-8' });
    res.end(b);
  };
  if (req.method === 'GET' && url.pathname === '/') return html(200, inboxPage(fake));
  if (req.method === 'POST' && url.pathname === '/reply') {
    const p = Object.fromEntries(new URLSearchParams(body));
    await fake.reply(p.from, p.body ?? 'STOP');
    res.writeHead(303, { location: '/' });
    return res.end();
  }
  if (req.method === 'POST' && url.pathname === '/api/inbound') {
    const p = JSON.parse(body || '{}');
    return json(res, 200, await fake.reply(p.from, p.body));
  }
  if (req.method === 'POST' && url.pathname === '/api/fail-next') {
    const p = JSON.parse(body || '{}');
    for (let i = 0; i < (p.count ?? 1); i++)
      fake.failures.push({ status: p.status ?? 500, code: p.code ?? 20500, message: p.message ?? 'Internal Server Error' });
    return json(res, 200, { queued: fake.failures.length });
  }
  const lists = {
    '/api/messages': () => fake.messages,
    '/api/requests': () => fake.requests,
    '/api/callbacks': () => fake.callbacks,
    '/api/replies': () => fake.inbound,
  };
  if (req.method === 'GET' && lists[url.pathname]) return json(res, 200, lists[url.pathname]());
  return providerError(res, 404, 20404, 'Not found');
}

/**
 * Starts the fake. Port 0 picks a free port. `authToken` signs callbacks and replies (the API's
 * TWILIO_AUTH_TOKEN); `inboundUrl` is where replies go (the API's /api/texts/inbound).
 */
export async function startTextFake(opts = {}) {
  const host = opts.host ?? '127.0.0.1';
  const fake = new FakeTexts(opts);
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://localhost');
    readBody(req)
      .then((body) => (url.pathname.startsWith('/2010-04-01/') ? api(fake, req, res, url, body) : site(fake, req, res, url, body)))
      .catch((e) => providerError(res, 500, 20500, String(e)));
  });
  const port = await new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(opts.port ?? 12112, host, () => ok(server.address().port));
  });
  return {
    ...{ port, url: `http://${host}:${port}`, messages: () => fake.messages, requests: () => fake.requests },
    ...{ callbacks: () => fake.callbacks, replies: () => fake.inbound },
    setInboundUrl: (u) => void (fake.inboundUrl = u),
    /** The next `count` message-create calls answer with this error instead of sending. */
    failNext: (count = 1, status = 500, code = 20500, message = 'Internal Server Error') => {
      for (let i = 0; i < count; i++) fake.failures.push({ status, code, message });
    },
    reply: (from, body) => fake.reply(from, body),
    statusCallback: (sid, status) => {
      const m = fake.messages.find((x) => x.sid === sid);
      return m ? fake.statusCallback(m, status) : Promise.resolve(null);
    },
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const apiBase = (process.env.PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/+$/, '');
  const fake = await startTextFake({
    port: Number(process.env.TEXT_FAKE_PORT ?? 12112),
    accountSid: process.env.TWILIO_ACCOUNT_SID,
    authToken: process.env.TWILIO_AUTH_TOKEN,
    inboundUrl: process.env.TEXT_FAKE_INBOUND_URL ?? `${apiBase}/api/texts/inbound`,
  });
  console.log(`[texts] Local text-message fake on ${fake.url} (inbox there)`);
  const stop = () => void fake.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
