import { CONDITIONS, CONDITION_LABELS, compareConditions, isCondition, needsAction, worstCondition, type Condition } from './condition';

describe('condition scale (DESIGN.md: sound, wearing, worn, unsafe)', () => {
  it('labels, with "do not ride" on unsafe', () => {
    expect(CONDITIONS.map((c) => CONDITION_LABELS[c])).toEqual(['Sound', 'Wearing', 'Worn', 'Unsafe — do not ride']);
  });

  it('orders by severity', () => {
    expect(compareConditions('sound', 'unsafe')).toBeLessThan(0);
    expect(compareConditions('worn', 'wearing')).toBeGreaterThan(0);
    expect(compareConditions('worn', 'worn')).toBe(0);
  });

  it.each<[Condition[], Condition | null]>([
    [[], null],
    [['sound'], 'sound'],
    [['sound', 'wearing', 'sound'], 'wearing'],
    [['worn', 'sound', 'unsafe', 'wearing'], 'unsafe'],
    [['wearing', 'worn'], 'worn'],
  ])('worst of %j is %s', (list, worst) => {
    expect(worstCondition(list)).toBe(worst);
  });

  it('needs action from worn up', () => {
    expect(CONDITIONS.filter(needsAction)).toEqual(['worn', 'unsafe']);
  });

  it('guards strings', () => {
    expect(isCondition('worn')).toBe(true);
    expect(isCondition('critical')).toBe(false);
  });
});
