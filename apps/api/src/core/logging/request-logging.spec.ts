import express from 'express';
import { Writable } from 'node:stream';
import pinoHttp, { type Options as PinoHttpOptions } from 'pino-http';
import request from 'supertest';
import { loadConfig } from '../../config';
import { redactUrl, requestLogging } from './request-logging';

const OWNER_SECRET = 'q7Vb3kLm9XzR2tYp5WcN8dFh4JsA';

/** Runs one request through the real logging options and returns the parsed log lines. */
async function logOf(send: (agent: request.Agent) => Promise<unknown>): Promise<string[]> {
  const lines: string[] = [];
  const sink = new Writable({ write: (chunk, _enc, done) => void (lines.push(String(chunk)), done()) });
  const cfg = loadConfig({ DATABASE_PATH: ':memory:', LOG_LEVEL: 'info' });
  const app = express();
  app.use(pinoHttp(requestLogging(cfg).pinoHttp as PinoHttpOptions, sink));
  app.get('/api/owner/:token', (req, res) => {
    (req as unknown as { user: object }).user = { id: 7, shopId: 3 };
    res.cookie('bp_session', 'jwt-value').status(200).json({ ok: true });
  });
  await send(request.agent(app));
  return lines;
}

describe('request logs (nestjs-pino options)', () => {
  it('logs request id, user, shop, route, status and duration, and no secrets', async () => {
    const [raw, ...rest] = await logOf((a) =>
      a
        .get(`/api/owner/${OWNER_SECRET}?token=abc123&view=1`)
        .set('Authorization', 'Bearer eyJhbGciOi.secret')
        .set('Cookie', 'bp_session=eyJ.session')
        .set('x-request-id', 'req-42'),
    );
    expect(rest).toEqual([]);
    const line = JSON.parse(raw) as Record<string, unknown>;
    expect(line).toMatchObject({
      userId: 7,
      shopId: 3,
      route: '/api/owner/:token',
      req: { id: 'req-42', method: 'GET', url: '/api/owner/[redacted]?token=%5Bredacted%5D&view=1' },
      res: { statusCode: 200 },
    });
    expect(typeof line.responseTime).toBe('number');
    // Each field once (pino-http also asks for them when the request starts, before there is a user).
    expect(raw.match(/"userId"/g)).toHaveLength(1);
    const text = raw;
    for (const secret of [OWNER_SECRET, 'abc123', 'eyJhbGciOi', 'eyJ.session', 'jwt-value']) expect(text).not.toContain(secret);
  });

  it('keeps short path segments (ids) and harmless query values', () => {
    expect(redactUrl('/api/jobs/12/media?phase=before&password=x')).toBe('/api/jobs/12/media?phase=before&password=%5Bredacted%5D');
  });
});
