import type { ChainReading } from './chain-wear';
import type { Condition } from './condition';
import { DomainInputError } from './errors';
import { formatNumber, requireInRange, requireInteger, roundTo } from './numeric';

/** A shop's chain replacement policy, in % elongation. */
export interface ChainLimitPolicy {
  /** Replace-at for 11-speed and wider drivetrains. */
  readonly replaceAt11Pct: number;
  /** Replace-at for 10-speed and narrower (incl. single speed). */
  readonly replaceAt10Pct: number;
  /** At or above this, the cassette (often the chainrings too) is likely worn. */
  readonly cassettePct: number;
}

/**
 * Defaults (CHECKS.md B.1, common practice, no source): 0.5 % for 11/12-speed,
 * 0.75 % for 9/10-speed — the marks of widely sold go/no-go gauges and their
 * sellers' advice — and 1.0 % where cassette wear is expected. Thresholds are
 * policy, not physics: the chain maker's instruction governs, so shops may
 * override them in settings.
 */
export const DEFAULT_CHAIN_LIMIT_POLICY: ChainLimitPolicy = {
  replaceAt11Pct: 0.5,
  replaceAt10Pct: 0.75,
  cassettePct: 1.0,
};

/**
 * No bicycle policy may go above this. The 3 % industrial roller-chain limit
 * (ANSI B29.1 via chain makers' FAQs) is 3–6× too loose for a bicycle; an
 * override above 2 % is taken as that mistake.
 */
export const MAX_BICYCLE_CHAIN_LIMIT_PCT = 2;

export interface ChainWearLimits {
  readonly replaceAtPct: number;
  readonly cassetteAtPct: number;
}

function checkPolicy(policy: ChainLimitPolicy): void {
  const range = { min: 0, minExclusive: true, max: MAX_BICYCLE_CHAIN_LIMIT_PCT };
  requireInRange('replace-at limit for 11-speed and up', policy.replaceAt11Pct, range);
  requireInRange('replace-at limit for 10-speed and below', policy.replaceAt10Pct, range);
  requireInRange('cassette limit', policy.cassettePct, range);
  if (policy.cassettePct < Math.max(policy.replaceAt11Pct, policy.replaceAt10Pct)) {
    throw new DomainInputError('OUT_OF_RANGE', 'The cassette limit must not be below a chain replace-at limit.', {
      ...policy,
    });
  }
}

/**
 * The limits for a drivetrain: replace at 0.5 % for ≥ 11 speeds, 0.75 % for
 * ≤ 10, cassette at 1.0 % (DEFAULT_CHAIN_LIMIT_POLICY) unless the shop's
 * policy says otherwise.
 */
export function chainWearLimits(speeds: number, policy: Partial<ChainLimitPolicy> = {}): ChainWearLimits {
  requireInteger('drivetrain speeds', speeds, { min: 1, max: 13 });
  const merged: ChainLimitPolicy = { ...DEFAULT_CHAIN_LIMIT_POLICY, ...policy };
  checkPolicy(merged);
  return {
    replaceAtPct: speeds >= 11 ? merged.replaceAt11Pct : merged.replaceAt10Pct,
    cassetteAtPct: merged.cassettePct,
  };
}

export type ChainWearVerdictCode = 'ok' | 'monitor' | 'replace_chain' | 'replace_chain_and_cassette';

export interface ChainWearVerdict {
  readonly condition: Condition;
  readonly verdict: ChainWearVerdictCode;
  readonly elongationPct: number;
  readonly limitPct: number;
  readonly cassetteAtPct: number;
  readonly cassetteLikelyWorn: boolean;
  readonly message: string;
}

/**
 * Below this share of the replace-at limit a chain reads as sound; from it
 * up to the limit as wearing (check again next visit). Our own policy
 * choice (common practice, no source): 0.3 % on an 11-speed, 0.45 % on a
 * 10-speed.
 */
export const CHAIN_MONITOR_FRACTION = 0.6;

function classify(pct: number, limits: ChainWearLimits): Pick<ChainWearVerdict, 'condition' | 'verdict'> {
  if (pct >= limits.cassetteAtPct) return { condition: 'worn', verdict: 'replace_chain_and_cassette' };
  if (pct >= limits.replaceAtPct) return { condition: 'worn', verdict: 'replace_chain' };
  if (pct >= roundTo(limits.replaceAtPct * CHAIN_MONITOR_FRACTION, 6)) return { condition: 'wearing', verdict: 'monitor' };
  return { condition: 'sound', verdict: 'ok' };
}

function speedsLabel(speeds: number): string {
  return speeds === 1 ? 'single-speed' : `${speeds}-speed`;
}

function methodText(reading: ChainReading): string {
  if (reading.method === 'gauge') return 'wear gauge reading; roller-contact gauges can read high';
  return `${reading.method} over ${reading.pitches ?? 0} pitches`;
}

const VERDICT_ADVICE: Readonly<Record<ChainWearVerdictCode, string>> = {
  ok: 'No action needed.',
  monitor: 'Check again at the next service.',
  replace_chain: 'Replace the chain.',
  replace_chain_and_cassette: 'Replace the chain; the cassette, and often the chainrings, are likely worn too.',
};

/**
 * Verdict for a chain reading against the drivetrain's limits. Boundaries
 * are inclusive: a reading AT the replace-at limit means replace.
 * Example message: "Chain elongation 0.52 % (ruler over 24 pitches; replace
 * at 0.5 % for 11-speed per shop policy; the chain maker's advice governs)."
 */
export function chainWearVerdict(reading: ChainReading, speeds: number, policy: Partial<ChainLimitPolicy> = {}): ChainWearVerdict {
  const limits = chainWearLimits(speeds, policy);
  const pct = reading.elongationPct;
  const { condition, verdict } = classify(pct, limits);
  const message =
    `Chain elongation ${formatNumber(pct, 2, 2)} % (${methodText(reading)}; ` +
    `replace at ${formatNumber(limits.replaceAtPct, 2)} % for ${speedsLabel(speeds)} per shop policy; ` +
    `the chain maker's advice governs). ${VERDICT_ADVICE[verdict]}`;
  return {
    condition,
    verdict,
    elongationPct: pct,
    limitPct: limits.replaceAtPct,
    cassetteAtPct: limits.cassetteAtPct,
    cassetteLikelyWorn: verdict === 'replace_chain_and_cassette',
    message,
  };
}
