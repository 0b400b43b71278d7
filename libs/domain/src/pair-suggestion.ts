import type { MediaArea, MediaKind, MediaPhase } from './media-tags';
import { hammingDistance, PHASH_BITS } from './perceptual-hash';

/** What the pair rules need to know about a shot. */
export interface PairShot {
  id: number;
  kind: MediaKind;
  phase: MediaPhase;
  area: MediaArea;
  /** ISO time the shot was taken (EXIF) or, failing that, uploaded; null if unknown. */
  takenAt: string | null;
  /** 64-bit pHash as 16 hex digits, null while not yet computed. */
  phash: string | null;
}

/** Kinds that can stand in a pair: stills only (a video has no single frame to compare). */
export const PAIRABLE_KINDS: readonly MediaKind[] = ['photo', 'scope_still'];

/** Why a before/after combination cannot be a pair, or null if it can. */
export type PairProblem = 'not_a_still' | 'before_not_before' | 'after_not_after' | 'same_shot';

export function pairProblem(before: PairShot, after: PairShot): PairProblem | null {
  if (before.id === after.id) return 'same_shot';
  if (!PAIRABLE_KINDS.includes(before.kind) || !PAIRABLE_KINDS.includes(after.kind)) return 'not_a_still';
  if (before.phase !== 'before') return 'before_not_before';
  if (after.phase !== 'after') return 'after_not_after';
  return null;
}

/**
 * Weights of the suggestion score (sum 1). Framing similarity carries the most: it is
 * what tells two drivetrain shots apart. Own tuning on the demo shots, no outside source.
 */
export const PAIR_WEIGHTS = { area: 0.35, order: 0.15, framing: 0.5 } as const;

/**
 * Hamming distance at which framing similarity reaches 0. Two unrelated 64-bit hashes
 * differ in about half their bits (32); Krawetz's rule of thumb (CHECKS.md B.9) calls
 * ≤ 10 a likely variant.
 */
export const UNRELATED_DISTANCE = PHASH_BITS / 2;

export interface PairSuggestion {
  beforeId: number;
  afterId: number;
  /** 0..1, higher is a likelier pair. */
  score: number;
  sameArea: boolean;
  /** 'after' if the after shot was taken later, 'before' if earlier, 'unknown' without both times. */
  order: 'after' | 'before' | 'unknown';
  /** Hamming distance of the two hashes, null if either is missing. */
  distance: number | null;
  /**
   * True for the one-to-one picks: taking the best-scoring combination, then the best
   * among shots not yet used, and so on. What a builder offers with one tap.
   */
  best: boolean;
}

/** Scores one before/after combination; null if the two cannot form a pair at all. */
export function scorePair(before: PairShot, after: PairShot): PairSuggestion | null {
  if (pairProblem(before, after)) return null;
  const sameArea = before.area === after.area;
  const order = captureOrder(before.takenAt, after.takenAt);
  const distance = before.phash && after.phash ? hammingDistance(before.phash, after.phash) : null;
  // An unknown hash or order counts as half: neither evidence for nor against.
  const framing = distance === null ? 0.5 : Math.max(0, 1 - distance / UNRELATED_DISTANCE);
  const orderScore = order === 'after' ? 1 : order === 'unknown' ? 0.5 : 0;
  const score = PAIR_WEIGHTS.area * (sameArea ? 1 : 0) + PAIR_WEIGHTS.order * orderScore + PAIR_WEIGHTS.framing * framing;
  return { beforeId: before.id, afterId: after.id, score: Math.round(score * 1e6) / 1e6, sameArea, order, distance, best: false };
}

function captureOrder(before: string | null, after: string | null): PairSuggestion['order'] {
  if (!before || !after) return 'unknown';
  const b = Date.parse(before);
  const a = Date.parse(after);
  if (Number.isNaN(a) || Number.isNaN(b) || a === b) return 'unknown';
  return a > b ? 'after' : 'before';
}

/**
 * Every before/after combination of a job's shots, leaving out shots already in a pair:
 * first the one-to-one picks (greedy by score, each shot used once, `best: true`), then
 * every other combination by score. Ties keep a stable order (lower before id, then after id).
 */
export function suggestPairs(shots: readonly PairShot[], alreadyPaired: ReadonlySet<number> = new Set()): PairSuggestion[] {
  const free = shots.filter((s) => !alreadyPaired.has(s.id));
  const out: PairSuggestion[] = [];
  for (const b of free.filter((s) => s.phase === 'before')) {
    for (const a of free.filter((s) => s.phase === 'after')) {
      const s = scorePair(b, a);
      if (s) out.push(s);
    }
  }
  out.sort((x, y) => y.score - x.score || x.beforeId - y.beforeId || x.afterId - y.afterId);
  const used = new Set<number>();
  for (const s of out) {
    if (used.has(s.beforeId) || used.has(s.afterId)) continue;
    s.best = true;
    used.add(s.beforeId).add(s.afterId);
  }
  return [...out.filter((s) => s.best), ...out.filter((s) => !s.best)];
}
