import { assessMeasurement, isDomainInputError, readChainElongation, type ChainLimitPolicy, type Condition, type MeasurementInput } from '@benchproof/domain';

export type LiveVerdict =
  { state: 'empty' } | { state: 'error'; message: string } | { state: 'ok'; condition: Condition; verdict: string; message: string; headline: string | null };

const pctText = (pct: number) => pct.toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 3, useGrouping: false });

/**
 * The same libs/domain computation the server runs, done in the browser as the
 * mechanic types. The server's stored verdict is the one that counts.
 */
export function liveVerdict(input: MeasurementInput | null, speeds: number, chainPolicy?: Partial<ChainLimitPolicy>): LiveVerdict {
  if (!input) return { state: 'empty' };
  try {
    const r = assessMeasurement(input, { drivetrainSpeeds: speeds, chainPolicy });
    const headline = input.kind === 'chain_elongation' ? `${pctText(readChainElongation(input).elongationPct)} % elongation` : null;
    return { state: 'ok', condition: r.condition, verdict: r.verdict, message: r.message, headline };
  } catch (e) {
    if (isDomainInputError(e)) return { state: 'error', message: e.message };
    throw e;
  }
}
