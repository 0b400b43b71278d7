import type { Condition } from './condition';

/** How soon a recommended job should be done (CHECKS.md A.2 step 4: safety-critical, recommended soon, advisory). */
export const URGENCIES = ['safety', 'soon', 'advisory'] as const;
export type Urgency = (typeof URGENCIES)[number];

export const URGENCY_LABELS: Readonly<Record<Urgency, string>> = {
  safety: 'Safety-critical',
  soon: 'Recommended soon',
  advisory: 'Advisory',
};

/** Most urgent first; the estimate lists groups in this order. */
export const URGENCY_ORDER: Readonly<Record<Urgency, number>> = { safety: 0, soon: 1, advisory: 2 };

/**
 * The urgency a recommendation starts with, from its finding's condition:
 * unsafe → safety, worn → soon, anything milder → advisory. The mechanic may change it.
 */
export function defaultUrgency(condition: Condition): Urgency {
  switch (condition) {
    case 'unsafe':
      return 'safety';
    case 'worn':
      return 'soon';
    case 'wearing':
    case 'sound':
      return 'advisory';
  }
}
