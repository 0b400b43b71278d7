import type { ConsentDto, ShotPairDto } from '@benchproof/contracts';

/**
 * Consent wordings whose text covers before/after photos of the bike and its parts
 * (libs/contracts CONSENT_WORDING). A consent given under any other wording does not
 * cover the showcase: the owner never read words that allow it.
 */
export const SHOWCASE_WORDINGS: readonly string[] = ['marketing-photos-v1'];

/** Why an item may not be shown, or null when the consent covers it. */
export type ScopeProblem = 'NO_CONSENT' | 'CONSENT_REVOKED' | null;

export function consentProblem(consent: ConsentDto | null): ScopeProblem {
  if (!consent) return 'NO_CONSENT';
  if (!consent.granted) return 'CONSENT_REVOKED';
  return SHOWCASE_WORDINGS.includes(consent.wordingVersion) ? null : 'NO_CONSENT';
}

/** "Photos of the bike only": both shots are stills still on the job (not deleted). */
export function pairInScope(pair: ShotPairDto): boolean {
  const ok = (a: ShotPairDto['before']) => (a.kind === 'photo' || a.kind === 'scope_still') && !a.deletedAt;
  return ok(pair.before) && ok(pair.after);
}

/** Whether a text names the bike's make or model (case-insensitive, whole words). */
export function namesBike(text: string, bike: { maker: string; model: string }): boolean {
  const words = [bike.maker, bike.model].map((w) => w.trim()).filter((w) => w.length >= 2);
  return words.some((w) => new RegExp(`(^|[^\\p{L}\\p{N}])${w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}($|[^\\p{L}\\p{N}])`, 'iu').test(text));
}
