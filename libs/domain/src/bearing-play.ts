import type { Condition } from './condition';
import type { CheckResult } from './clearance';
import { formatNumber, requireInRange } from './numeric';

export const BEARING_PLAY_GRADES = ['none', 'slight', 'marked'] as const;
export type BearingPlayGrade = (typeof BEARING_PLAY_GRADES)[number];

export const BEARING_PLAY_GRADE_LABELS: Readonly<Record<BearingPlayGrade, string>> = {
  none: 'No play',
  slight: 'Slight play',
  marked: 'Marked play',
};

export const BEARINGS = ['headset', 'front_hub', 'rear_hub', 'bottom_bracket'] as const;
export type Bearing = (typeof BEARINGS)[number];

export const BEARING_LABELS: Readonly<Record<Bearing, string>> = {
  headset: 'Headset',
  front_hub: 'Front hub',
  rear_hub: 'Rear hub',
  bottom_bracket: 'Bottom bracket',
};

/** How the play is felt at the bench (CHECKS.md B.10, common practice, no source). */
export const BEARING_PLAY_METHODS: Readonly<Record<Bearing, string>> = {
  headset: 'rock the bike with the front brake on',
  front_hub: 'rock the rim side to side',
  rear_hub: 'rock the rim side to side',
  bottom_bracket: 'rock the crank arms',
};

export type BearingPlayVerdictCode = 'none' | 'adjust' | 'adjust_or_replace';

const GRADE_RESULT: Readonly<Record<BearingPlayGrade, { condition: Condition; verdict: BearingPlayVerdictCode; advice: string }>> = {
  none: { condition: 'sound', verdict: 'none', advice: 'No action needed.' },
  slight: { condition: 'wearing', verdict: 'adjust', advice: 'Adjust.' },
  marked: { condition: 'worn', verdict: 'adjust_or_replace', advice: 'Adjust, or replace the bearing if adjustment does not remove it.' },
};

/**
 * Bearing play is graded by feel: there is no numeric workshop standard
 * (ISO 4210-2 4.7.5 only asks for no tight spots, stiffness or slackness).
 * An optional dial-gauge reading is kept for comparison between visits and
 * never judged against a limit.
 */
export function bearingPlayVerdict(grade: BearingPlayGrade, bearing: Bearing, dialGaugeMm?: number | null): CheckResult<BearingPlayVerdictCode> {
  const r = GRADE_RESULT[grade];
  let dial = '';
  if (dialGaugeMm !== undefined && dialGaugeMm !== null) {
    requireInRange('dial gauge reading', dialGaugeMm, { min: 0, max: 10 });
    dial = ` Dial gauge ${formatNumber(dialGaugeMm, 3)} mm, recorded for comparison only.`;
  }
  return {
    condition: r.condition,
    verdict: r.verdict,
    message: `${BEARING_LABELS[bearing]}: ${BEARING_PLAY_GRADE_LABELS[grade].toLowerCase()} (${BEARING_PLAY_METHODS[bearing]}; graded by feel, no numeric standard). ${r.advice}${dial}`,
  };
}
