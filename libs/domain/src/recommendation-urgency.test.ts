import { CONDITIONS } from './condition';
import { defaultUrgency, URGENCIES, URGENCY_LABELS } from './recommendation-urgency';

describe('default urgency of a recommendation (CHECKS.md A.2 step 4)', () => {
  it.each([
    ['unsafe', 'safety'],
    ['worn', 'soon'],
    ['wearing', 'advisory'],
    ['sound', 'advisory'],
  ] as const)('%s finding → %s', (condition, urgency) => {
    expect(defaultUrgency(condition)).toBe(urgency);
  });

  it('covers every condition with a known urgency', () => {
    for (const c of CONDITIONS) expect(URGENCIES).toContain(defaultUrgency(c));
  });

  it('uses the trade words for the three levels', () => {
    expect(Object.values(URGENCY_LABELS)).toEqual(['Safety-critical', 'Recommended soon', 'Advisory']);
  });
});
