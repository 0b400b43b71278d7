import type { OwnerFinding } from '@benchproof/contracts';
import { useMemo, useState } from 'react';

export type Choice = 'approved' | 'declined';

/** The owner's choices before they confirm, and the running total of what they approved. */
export function useChoices(findings: OwnerFinding[]) {
  const [choices, setChoices] = useState<Record<number, Choice>>({});
  const pending = useMemo(() => findings.filter((f) => f.recommendation?.decisionStatus === 'pending'), [findings]);
  const approvedMinor = pending.reduce(
    (sum, f) => (f.recommendation && choices[f.recommendation.id] === 'approved' ? sum + f.recommendation.totals.grossMinor : sum),
    0,
  );
  /** Items approved on an earlier visit count in the total the owner sees, beside this visit's choices. */
  const earlierMinor = findings.reduce((sum, f) => (f.recommendation?.decisionStatus === 'approved' ? sum + f.recommendation.totals.grossMinor : sum), 0);
  const pendingMinor = pending.reduce((sum, f) => sum + (f.recommendation?.totals.grossMinor ?? 0), 0);
  const chosen = pending.filter((f) => f.recommendation && choices[f.recommendation.id]);
  return {
    choices,
    choose: (recId: number, c: Choice) => setChoices((prev) => ({ ...prev, [recId]: c })),
    reset: () => setChoices({}),
    pending,
    chosen,
    approvedMinor,
    totalApprovedMinor: earlierMinor + approvedMinor,
    pendingMinor,
  };
}
