import type { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { DomainError } from '../core/http';

/**
 * Refuses passwords that are among the commonest or built from the person's or shop's own name or
 * e-mail. zxcvbn-ts scores guessability 0–4 against its bundled frequency lists (common passwords,
 * English words, names) plus the words we pass in; below 3 (fewer than ~10^8 guesses, the library's
 * "safely unguessable" threshold) is refused. The 10-character minimum is checked by the contract.
 */
let made: ZxcvbnFactory | undefined;
/**
 * Made with the first password checked, not at boot: the frequency lists and their ranked dictionaries are
 * about 35 MB of resident memory (issue 22) that a running shop needs only when someone sets a password.
 */
function checker(): ZxcvbnFactory {
  if (made) return made;
  /* eslint-disable @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above */
  const { ZxcvbnFactory: Factory } = require('@zxcvbn-ts/core') as typeof import('@zxcvbn-ts/core');
  const common = require('@zxcvbn-ts/language-common') as typeof import('@zxcvbn-ts/language-common');
  const english = require('@zxcvbn-ts/language-en') as typeof import('@zxcvbn-ts/language-en');
  /* eslint-enable @typescript-eslint/no-require-imports */
  return (made = new Factory({ dictionary: { ...common.dictionary, ...english.dictionary }, graphs: common.adjacencyGraphs }));
}

/** The lowest accepted zxcvbn score (0–4). */
export const MIN_PASSWORD_SCORE = 3;

export interface PasswordContext {
  userName?: string;
  email?: string;
  shopName?: string;
}

/** Words from the person and the shop that a password must not lean on. */
export function personalWords(ctx: PasswordContext): string[] {
  const [local = '', domain = ''] = (ctx.email ?? '').split('@');
  const phrases = [ctx.userName ?? '', ctx.shopName ?? '', local, domain.split('.')[0] ?? ''];
  const words: string[] = [];
  for (const phrase of phrases) {
    const parts = phrase.split(/[^\p{L}\p{N}]+/u).filter(Boolean);
    words.push(phrase, parts.join(''), ...parts);
    // Adjacent pairs too ("Lantern & Spoke Workshop" gives "lanternspoke"): the matcher finds a whole word, not its halves.
    for (let i = 0; i + 1 < parts.length; i++) words.push(parts[i] + parts[i + 1]);
  }
  return [...new Set(words.map((w) => w.trim().toLowerCase()).filter((w) => w.length >= 3))];
}

/** Throws WEAK_PASSWORD (details: field, score) when the password is too easy to guess. */
export function assertStrongPassword(password: string, ctx: PasswordContext, field = 'password'): void {
  const result = checker().check(password, personalWords(ctx));
  if (result.score < MIN_PASSWORD_SCORE) {
    throw new DomainError('WEAK_PASSWORD', undefined, {
      field,
      score: result.score,
      issues: [{ path: field, message: 'Too easy to guess: avoid common passwords and your own or the shop’s name.' }],
    });
  }
}
