/**
 * BenchProof's own four-step condition scale (DESIGN.md), from best to worst.
 * The array order IS the severity order.
 */
export const CONDITIONS = ['sound', 'wearing', 'worn', 'unsafe'] as const;
export type Condition = (typeof CONDITIONS)[number];

export const CONDITION_LABELS: Readonly<Record<Condition, string>> = {
  sound: 'Sound',
  wearing: 'Wearing',
  worn: 'Worn',
  unsafe: 'Unsafe — do not ride',
};

/** Severity rank: 0 = sound … 3 = unsafe. */
export const CONDITION_SEVERITY: Readonly<Record<Condition, number>> = {
  sound: 0,
  wearing: 1,
  worn: 2,
  unsafe: 3,
};

/** Type guard for untrusted strings. */
export function isCondition(value: unknown): value is Condition {
  return typeof value === 'string' && (CONDITIONS as readonly string[]).includes(value);
}

/** Negative when `a` is better than `b`, positive when worse, 0 when equal. */
export function compareConditions(a: Condition, b: Condition): number {
  return CONDITION_SEVERITY[a] - CONDITION_SEVERITY[b];
}

/** The worst condition in the list, or null for an empty list (nothing assessed yet). */
export function worstCondition(list: readonly Condition[]): Condition | null {
  let worst: Condition | null = null;
  for (const c of list) {
    if (worst === null || compareConditions(c, worst) > 0) worst = c;
  }
  return worst;
}

/** True for the conditions that need the owner's attention (worn or unsafe). */
export function needsAction(condition: Condition): boolean {
  return CONDITION_SEVERITY[condition] >= CONDITION_SEVERITY.worn;
}
