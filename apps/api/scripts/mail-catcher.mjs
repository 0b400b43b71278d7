#!/usr/bin/env node
// The local mail fake: a real SMTP server on loopback and an inbox page to read what it caught.
// `npm run mail` runs it (SMTP 1025, inbox http://127.0.0.1:1080); `npm start` starts it beside the
// API when SMTP_URL points at it; tests import startMailCatcher() and listen on free ports (0).
// Messages live in memory only: this is a developer's inbox, never a relay.
import { createHash } from 'node:crypto';
import { createServer } from 'node:http';
import { pathToFileURL } from 'node:url';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const esc = (s) => String(s ?? '').replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);
const addr = (a) => (a ? (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ') : '');

/** What the JSON API and tests see of one caught message (attachments without their bytes). */
function summary(m) {
  return {
    id: m.id,
    messageId: m.parsed.messageId ?? null,
    from: addr(m.parsed.from),
    to: addr(m.parsed.to),
    envelopeTo: m.envelopeTo,
    subject: m.parsed.subject ?? '',
    date: m.receivedAt,
    text: m.parsed.text ?? '',
    html: typeof m.parsed.html === 'string' ? m.parsed.html : null,
    attachments: m.parsed.attachments.map((a, i) => ({
      index: i,
      filename: a.filename ?? `attachment-${i}`,
      contentType: a.contentType,
      size: a.size,
      sha256: createHash('sha256').update(a.content).digest('hex'),
    })),
  };
}

const PAGE_STYLE =
  'body{font:16px/1.45 system-ui,sans-serif;margin:0;color:#1b1f23;background:#f4f5f4}header{background:#1f5f5b;color:#fff;padding:12px 16px}' +
  'main{padding:12px 16px;max-width:960px}a{color:#0b4f8a}table{border-collapse:collapse;width:100%;background:#fff}td,th{padding:10px 8px;border-bottom:1px solid #ddd;text-align:left;vertical-align:top}' +
  '.row a{display:block;min-height:24px}.att{display:inline-block;padding:10px 12px;margin:4px 4px 0 0;border:1px solid #1f5f5b;border-radius:6px;min-height:24px}' +
  'iframe{width:100%;height:60vh;border:1px solid #ccc;background:#fff}pre{white-space:pre-wrap;background:#fff;padding:12px;border:1px solid #ddd}dl{display:grid;grid-template-columns:max-content 1fr;gap:4px 12px}dt{font-weight:600}' +
  '.narrow{display:none;color:#4a4f55;word-break:break-all}@media (max-width:600px){.wide{display:none}.narrow{display:block}}';

const page = (title, body) =>
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">` +
  `<title>${esc(title)}</title><style>${PAGE_STYLE}</style></head><body><header><strong>Local mail catcher</strong> · nothing here leaves this machine</header><main>${body}</main></body></html>`;

function listPage(messages) {
  if (!messages.length) return page('Inbox', '<h1>Inbox</h1><p>No messages caught yet.</p>');
  const rows = [...messages].reverse().map((m) => {
    const s = summary(m);
    const atts = s.attachments.map((a) => `<a class="att" href="/messages/${s.id}/attachments/${a.index}">${esc(a.filename)}</a>`).join(' ');
    // On a phone the To and Received columns fold away and the recipient sits under the subject.
    return `<tr class="row"><td><a href="/messages/${s.id}">${esc(s.subject || '(no subject)')}</a><div class="narrow">To ${esc(s.to)}</div><div>${atts}</div></td><td class="wide">${esc(s.to)}</td><td class="wide">${esc(s.date)}</td></tr>`;
  });
  return page(
    'Inbox',
    `<h1>Inbox (${messages.length})</h1><table><thead><tr><th>Subject</th><th class="wide">To</th><th class="wide">Received</th></tr></thead><tbody>${rows.join('')}</tbody></table>`,
  );
}

function messagePage(m) {
  const s = summary(m);
  const atts = s.attachments
    .map(
      (a) =>
        `<li><a class="att" href="/messages/${s.id}/attachments/${a.index}">${esc(a.filename)}</a> ${esc(a.contentType)}, ${a.size} bytes, SHA-256 <code>${esc(a.sha256)}</code></li>`,
    )
    .join('');
  // The HTML body goes into a sandboxed frame with no scripts, so a message cannot touch the inbox page.
  const html = s.html === null ? '' : `<h2>HTML</h2><iframe sandbox="" title="HTML body" srcdoc="${esc(s.html)}"></iframe>`;
  return page(
    s.subject,
    `<p><a href="/">← Inbox</a></p><h1>${esc(s.subject)}</h1><dl><dt>From</dt><dd>${esc(s.from)}</dd><dt>To</dt><dd>${esc(s.to)}</dd>` +
      `<dt>Message-ID</dt><dd>${esc(s.messageId)}</dd><dt>Received</dt><dd>${esc(s.date)}</dd></dl>${atts ? `<h2>Attachments</h2><ul>${atts}</ul>` : ''}${html}<h2>Plain text</h2><pre>${esc(s.text)}</pre>`,
  );
}

function route(messages, req, res) {
  const url = new URL(req.url ?? '/', 'http://catcher');
  const send = (status, type, body) => {
    res.writeHead(status, { 'content-type': type, 'cache-control': 'no-store' });
    res.end(body);
  };
  const find = (id) => messages.find((m) => m.id === Number(id));
  const parts = url.pathname.split('/').filter(Boolean);
  if (req.method === 'DELETE' && url.pathname === '/api/messages') {
    messages.splice(0);
    return send(204, 'text/plain', '');
  }
  if (req.method !== 'GET') return send(405, 'text/plain', 'Method not allowed');
  if (url.pathname === '/') return send(200, 'text/html; charset=utf-8', listPage(messages));
  if (url.pathname === '/api/messages') return send(200, 'application/json', JSON.stringify(messages.map(summary)));
  const m = parts.length >= 2 ? find(parts.at(parts[0] === 'api' ? 2 : 1)) : undefined;
  if (m && parts[0] === 'api' && parts.length === 3) return send(200, 'application/json', JSON.stringify(summary(m)));
  if (m && parts[0] === 'messages' && parts.length === 2) return send(200, 'text/html; charset=utf-8', messagePage(m));
  const att = m && parts[0] === 'messages' && parts[2] === 'attachments' ? m.parsed.attachments[Number(parts[3])] : undefined;
  if (att) {
    res.writeHead(200, {
      'content-type': att.contentType,
      'content-disposition': `attachment; filename="${encodeURIComponent(att.filename ?? 'attachment')}"`,
    });
    return res.end(att.content);
  }
  return send(404, 'text/plain', 'Not found');
}

const listen = (server, port, host) =>
  new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(port, host, () => ok(server.address().port));
  });

/**
 * Starts the catcher. Port 0 picks a free port (tests). Resolves once both servers listen.
 * @param {{smtpPort?: number, httpPort?: number, host?: string}} [opts]
 */
export async function startMailCatcher(opts = {}) {
  const host = opts.host ?? '127.0.0.1';
  const messages = [];
  let nextId = 1;
  let waiters = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'BenchProof local mail catcher',
    onData(stream, session, done) {
      simpleParser(stream).then((parsed) => {
        messages.push({ id: nextId++, parsed, envelopeTo: session.envelope.rcptTo.map((r) => r.address), receivedAt: new Date().toISOString() });
        for (const w of waiters) w();
        done();
      }, done);
    },
  });
  const http = createServer((req, res) => route(messages, req, res));
  const smtpPort = await listen(smtp.server, opts.smtpPort ?? 1025, host);
  const httpPort = await listen(http, opts.httpPort ?? 1080, host);
  return {
    smtpPort,
    httpPort,
    url: `http://${host}:${httpPort}`,
    smtpUrl: `smtp://${host}:${smtpPort}`,
    messages: () => messages.map(summary),
    attachment: (id, index) => find(messages, id)?.parsed.attachments[index]?.content ?? null,
    /** Resolves when at least n messages have arrived, or rejects after timeoutMs. */
    waitFor(n, timeoutMs = 10_000) {
      return new Promise((ok, fail) => {
        const check = () => {
          if (messages.length < n) return false;
          waiters = waiters.filter((w) => w !== check);
          clearTimeout(timer);
          ok(messages.map(summary));
          return true;
        };
        const timer = setTimeout(() => {
          waiters = waiters.filter((w) => w !== check);
          fail(new Error(`Expected ${n} message(s), caught ${messages.length}`));
        }, timeoutMs);
        if (!check()) waiters.push(check);
      });
    },
    close: () => Promise.all([new Promise((ok) => smtp.close(ok)), new Promise((ok) => http.close(() => ok()))]).then(() => undefined),
  };
}

const find = (messages, id) => messages.find((m) => m.id === Number(id));

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const catcher = await startMailCatcher({ smtpPort: Number(process.env.MAIL_SMTP_PORT ?? 1025), httpPort: Number(process.env.MAIL_HTTP_PORT ?? 1080) });
  console.log(`[mail] Catching SMTP on ${catcher.smtpUrl}; inbox at ${catcher.url}`);
  const stop = () => void catcher.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
