import { CHAIN_MONITOR_FRACTION, DEFAULT_CHAIN_LIMIT_POLICY, MAX_BICYCLE_CHAIN_LIMIT_PCT, chainWearLimits, chainWearVerdict } from './chain-limits';
import { chainElongationFromGauge, chainElongationFromRuler, type ChainReading } from './chain-wear';
import { DomainInputError } from './errors';

const gauge = (pct: number): ChainReading => chainElongationFromGauge(pct);

describe('chainWearLimits', () => {
  it.each([
    // CHECKS.md B.1 [CP]: 0.5 % for 11/12-speed, 0.75 % for 9/10-speed, 1.0 % cassette.
    { speeds: 1, replaceAtPct: 0.75 },
    { speeds: 9, replaceAtPct: 0.75 },
    { speeds: 10, replaceAtPct: 0.75 },
    { speeds: 11, replaceAtPct: 0.5 },
    { speeds: 12, replaceAtPct: 0.5 },
    { speeds: 13, replaceAtPct: 0.5 },
  ])('$speeds speeds → replace at $replaceAtPct %', ({ speeds, replaceAtPct }) => {
    expect(chainWearLimits(speeds)).toEqual({ replaceAtPct, cassetteAtPct: 1 });
  });

  it('takes a shop override', () => {
    // Thresholds are policy, configurable per shop (CHECKS.md B.1 / E).
    expect(chainWearLimits(12, { replaceAt11Pct: 0.4 })).toEqual({ replaceAtPct: 0.4, cassetteAtPct: 1 });
    expect(chainWearLimits(8, { replaceAt10Pct: 0.6, cassettePct: 0.9 })).toEqual({ replaceAtPct: 0.6, cassetteAtPct: 0.9 });
  });

  it.each([0, 14, 10.5])('rejects %s speeds', (speeds) => {
    expect(() => chainWearLimits(speeds)).toThrow(DomainInputError);
  });

  it('rejects a cassette limit below a chain limit, and non-positive limits', () => {
    expect(() => chainWearLimits(11, { cassettePct: 0.6 })).toThrow(/cassette limit/);
    expect(() => chainWearLimits(11, { replaceAt11Pct: 0 })).toThrow(DomainInputError);
  });
});

describe('never the 3 % industrial limit (CHECKS.md B.1 negative test)', () => {
  // A chain/bearing maker's FAQ citing ANSI B29.1 / B29.3: industrial roller chain limit 3 %.
  const INDUSTRIAL_PCT = 3;

  it('default bicycle thresholds are 3–6× tighter than the industrial limit', () => {
    for (const speeds of [1, 8, 9, 10, 11, 12, 13]) {
      const { replaceAtPct, cassetteAtPct } = chainWearLimits(speeds);
      expect(INDUSTRIAL_PCT / replaceAtPct).toBeGreaterThanOrEqual(4);
      expect(INDUSTRIAL_PCT / replaceAtPct).toBeLessThanOrEqual(6);
      expect(INDUSTRIAL_PCT / cassetteAtPct).toBe(3);
    }
    expect(DEFAULT_CHAIN_LIMIT_POLICY).toEqual({ replaceAt11Pct: 0.5, replaceAt10Pct: 0.75, cassettePct: 1 });
  });

  it('a shop cannot set 3 % as a bicycle limit', () => {
    expect(MAX_BICYCLE_CHAIN_LIMIT_PCT).toBeLessThan(INDUSTRIAL_PCT);
    expect(() => chainWearLimits(11, { replaceAt11Pct: 3, cassettePct: 3 })).toThrow(DomainInputError);
    expect(() => chainWearLimits(9, { replaceAt10Pct: 3, cassettePct: 3 })).toThrow(DomainInputError);
  });

  it('a 2.9 % chain, fine by the industrial rule, is replace chain and cassette', () => {
    expect(chainWearVerdict(gauge(2.9), 10).verdict).toBe('replace_chain_and_cassette');
  });
});

describe('chainWearVerdict boundaries (≥ means at the limit → replace)', () => {
  // Limits: CHECKS.md B.1 [CP]; monitor band from 0.6 × replace-at is BenchProof policy (no source).
  it.each([
    { pct: 0, speeds: 11, verdict: 'ok', condition: 'sound' },
    { pct: 0.299999, speeds: 11, verdict: 'ok', condition: 'sound' },
    { pct: 0.3, speeds: 11, verdict: 'monitor', condition: 'wearing' },
    { pct: 0.499999, speeds: 11, verdict: 'monitor', condition: 'wearing' },
    { pct: 0.5, speeds: 11, verdict: 'replace_chain', condition: 'worn' },
    { pct: 0.999999, speeds: 12, verdict: 'replace_chain', condition: 'worn' },
    { pct: 1, speeds: 12, verdict: 'replace_chain_and_cassette', condition: 'worn' },
    { pct: 0.449999, speeds: 10, verdict: 'ok', condition: 'sound' },
    { pct: 0.45, speeds: 10, verdict: 'monitor', condition: 'wearing' },
    { pct: 0.5, speeds: 10, verdict: 'monitor', condition: 'wearing' },
    { pct: 0.749999, speeds: 9, verdict: 'monitor', condition: 'wearing' },
    { pct: 0.75, speeds: 9, verdict: 'replace_chain', condition: 'worn' },
    { pct: 1, speeds: 9, verdict: 'replace_chain_and_cassette', condition: 'worn' },
  ])('$pct % on $speeds speeds → $verdict', ({ pct, speeds, verdict, condition }) => {
    const result = chainWearVerdict(gauge(pct), speeds);
    expect(result.verdict).toBe(verdict);
    expect(result.condition).toBe(condition);
    expect(result.cassetteLikelyWorn).toBe(verdict === 'replace_chain_and_cassette');
  });

  it('the monitor band starts at 0.6 × the replace-at limit', () => {
    expect(CHAIN_MONITOR_FRACTION).toBe(0.6);
  });

  it('a ruler exactly on the worked 0.5 % length (306.324 mm / 24 pitches) means replace on 11-speed', () => {
    // CHECKS.md B.1 worked numbers: 306.324 mm = 0.5 % over 24 pitches.
    const result = chainWearVerdict(chainElongationFromRuler(24, 306.324, 'mm'), 11);
    expect(result.verdict).toBe('replace_chain');
    expect(result.limitPct).toBe(0.5);
  });

  it('1/16 in past 12 in: replace on 11-speed, monitor on 10-speed; 1/8 in: cassette too', () => {
    // Sheldon Brown's 12-inch rule via pushbikes.org.uk (CHECKS.md B.1): ≥ 1/16 in replace chain, ≥ 1/8 in cassette wear.
    expect(chainWearVerdict(chainElongationFromRuler(24, 12 + 1 / 16, 'in'), 11).verdict).toBe('replace_chain');
    expect(chainWearVerdict(chainElongationFromRuler(24, 12 + 1 / 16, 'in'), 10).verdict).toBe('monitor');
    expect(chainWearVerdict(chainElongationFromRuler(24, 12 + 1 / 8, 'in'), 10).verdict).toBe('replace_chain_and_cassette');
  });

  it('uses the shop policy when given', () => {
    expect(chainWearVerdict(gauge(0.45), 11, { replaceAt11Pct: 0.4 }).verdict).toBe('replace_chain');
  });
});

describe('chainWearVerdict message names method, threshold and deference (CHECKS.md D)', () => {
  it('matches the documented example', () => {
    // CHECKS.md D: "Chain elongation 0.52 % (ruler over 24 pitches; replace-at threshold 0.5 % per this shop's policy, chain maker's advice governs)".
    const result = chainWearVerdict(chainElongationFromRuler(24, 12 + 1 / 16, 'in'), 11);
    expect(result.message).toBe(
      "Chain elongation 0.52 % (ruler over 24 pitches; replace at 0.5 % for 11-speed per shop policy; the chain maker's advice governs). Replace the chain.",
    );
  });

  it('says that gauges can read high, and names the cassette when it is likely worn', () => {
    const result = chainWearVerdict(gauge(1), 9);
    expect(result.message).toContain('wear gauge reading; roller-contact gauges can read high');
    expect(result.message).toContain('replace at 0.75 % for 9-speed');
    expect(result.message).toContain('cassette');
  });

  it('labels single speed', () => {
    expect(chainWearVerdict(gauge(0), 1).message).toContain('for single-speed');
  });
});
