import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { totpAt } from '../../src/two-factor/totp';
import type { TestApp } from '../test-app';

/** Passwords that pass the guessability check (zxcvbn-ts score ≥ 3) and carry no demo names. */
export const STRONG = 'quiet-gravel-otter-52';
export const STRONG_2 = 'rosehip-spanner-87';

/** The `nth` caught message to an address (1-based), waiting up to 10 s for it to arrive. */
export async function mailTo(catcher: MailCatcher, to: string, nth: number) {
  const deadline = Date.now() + 10_000;
  for (;;) {
    const mine = catcher.messages().filter((m) => m.envelopeTo.includes(to));
    if (mine.length >= nth) return mine[nth - 1];
    if (Date.now() > deadline) throw new Error(`Expected ${nth} message(s) to ${to}, caught ${mine.length}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** The token after '#' in the first link to `path` in a message's text. */
export function linkToken(text: string, path: string): string {
  const m = new RegExp(`https?://[^\\s]+${path}#([A-Za-z0-9_-]+)`).exec(text);
  if (!m) throw new Error(`No ${path} link in:\n${text}`);
  return m[1];
}

/** A cookie agent that echoes the CSRF token from a sign-in answer. */
export function withCsrf(agent: TestAgent, body: { csrfToken: string }): TestAgent {
  agent.set('x-csrf-token', body.csrfToken);
  return agent;
}

export const newAgent = (t: TestApp): TestAgent => request.agent(t.app.getHttpServer());

/** A code for the secret now, as an authenticator app would show it (RFC 6238, 30 s steps). */
export const codeNow = (secret: string, offsetSeconds = 0): string => totpAt(secret, Math.floor(Date.now() / 1000) + offsetSeconds);
