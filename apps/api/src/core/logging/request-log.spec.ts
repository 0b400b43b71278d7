import express from 'express';
import { Writable } from 'node:stream';
import request from 'supertest';
import { createLogger, NestPinoLogger, redactUrl, requestLog } from './request-log';

const OWNER_SECRET = 'q7Vb3kLm9XzR2tYp5WcN8dFh4JsA';

function sink(lines: string[]) {
  return new Writable({ write: (chunk, _enc, done) => void (lines.push(String(chunk)), done()) });
}

/** Runs one request through the real request log and returns the parsed log lines once the response closed. */
async function logOf(send: (agent: request.Agent) => Promise<unknown>, level: 'info' | 'warn' = 'info'): Promise<string[]> {
  const lines: string[] = [];
  const app = express();
  app.use(requestLog(createLogger({ LOG_LEVEL: level }, sink(lines))));
  app.get('/api/owner/:token', (req, res) => {
    (req as unknown as { user: object }).user = { id: 7, shopId: 3 };
    res.cookie('bp_session', 'jwt-value').status(200).json({ ok: true });
  });
  app.get('/api/health', (_req, res) => res.json({ ok: true }));
  await send(request.agent(app));
  await new Promise((r) => setImmediate(r));
  return lines;
}

describe('request logs', () => {
  it('logs request id, user, shop, route, status and duration, and no secrets', async () => {
    const [raw, ...rest] = await logOf((a) =>
      a
        .get(`/api/owner/${OWNER_SECRET}?token=abc123&view=1`)
        .set('Authorization', 'Bearer eyJhbGciOi.secret')
        .set('Cookie', 'bp_session=eyJ.session')
        .set('x-request-id', 'req-42')
        .expect('x-request-id', 'req-42'),
    );
    expect(rest).toEqual([]);
    const line = JSON.parse(raw) as Record<string, unknown>;
    expect(line).toMatchObject({
      level: 30,
      msg: 'request completed',
      userId: 7,
      shopId: 3,
      route: '/api/owner/:token',
      req: { id: 'req-42', method: 'GET', url: '/api/owner/[redacted]?token=%5Bredacted%5D&view=1' },
      res: { statusCode: 200 },
    });
    expect(typeof line.responseTime).toBe('number');
    for (const secret of [OWNER_SECRET, 'abc123', 'eyJhbGciOi', 'eyJ.session', 'jwt-value']) expect(raw).not.toContain(secret);
  });

  it('gives a request without a usable id a new one, and leaves health checks and unknown routes at warn out at LOG_LEVEL=warn', async () => {
    const lines = await logOf(async (a) => {
      const res = await a.get('/api/owner/x').set('x-request-id', 'bad id with spaces').expect(200);
      expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
      await a.get('/api/health').expect(200);
      await a.get('/api/nowhere').expect(404);
    }, 'warn');
    expect(lines.map((l) => JSON.parse(l) as { msg: string; res: { statusCode: number } })).toMatchObject([
      { msg: 'request completed', res: { statusCode: 404 } },
    ]);
  });

  it('keeps short path segments (ids) and harmless query values', () => {
    expect(redactUrl('/api/jobs/12/media?phase=before&password=x')).toBe('/api/jobs/12/media?phase=before&password=%5Bredacted%5D');
  });

  it('writes Nest’s own lines with their context', () => {
    const lines: string[] = [];
    new NestPinoLogger(createLogger({ LOG_LEVEL: 'info' }, sink(lines))).log('Serving web and API', 'BenchProof');
    expect(JSON.parse(lines[0])).toMatchObject({ level: 30, context: 'BenchProof', msg: 'Serving web and API' });
  });
});
