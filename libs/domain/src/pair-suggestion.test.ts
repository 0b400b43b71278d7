import { pairProblem, scorePair, suggestPairs, PAIR_WEIGHTS, type PairShot } from './pair-suggestion';

const shot = (over: Partial<PairShot> & { id: number }): PairShot => ({
  kind: 'photo',
  phase: 'before',
  area: 'drivetrain',
  takenAt: '2026-03-02T09:00:00Z',
  phash: '0000000000000000',
  ...over,
});

// Own rules (DESIGN.md "Shot pair"): stills only, before then after, same area, later
// capture, similar framing. Weights are own tuning, no outside source.
describe('pairProblem', () => {
  it.each([
    [shot({ id: 1 }), shot({ id: 2, phase: 'after' }), null],
    [shot({ id: 1, kind: 'scope_still' }), shot({ id: 2, phase: 'after', kind: 'scope_still' }), null],
    [shot({ id: 1, kind: 'video' }), shot({ id: 2, phase: 'after' }), 'not_a_still'],
    [shot({ id: 1 }), shot({ id: 2, phase: 'after', kind: 'scope_video' }), 'not_a_still'],
    [shot({ id: 1, phase: 'during' }), shot({ id: 2, phase: 'after' }), 'before_not_before'],
    [shot({ id: 1 }), shot({ id: 2, phase: 'before' }), 'after_not_after'],
    [shot({ id: 1 }), shot({ id: 1, phase: 'after' }), 'same_shot'],
  ] as const)('case %#', (b, a, problem) => {
    expect(pairProblem(b, a)).toBe(problem);
  });
});

describe('scorePair', () => {
  const before = shot({ id: 1, phash: '0000000000000000' });
  it.each([
    // [after, expected score, distance, order]
    [{ phash: '0000000000000000', takenAt: '2026-03-03T15:00:00Z' }, 1, 0, 'after'],
    [{ phash: '00000000000000ff', takenAt: '2026-03-03T15:00:00Z' }, 0.35 + 0.15 + 0.5 * (1 - 8 / 32), 8, 'after'],
    [{ phash: '00000000ffffffff', takenAt: '2026-03-03T15:00:00Z' }, 0.5, 32, 'after'],
    [{ phash: 'ffffffffffffffff', takenAt: '2026-03-03T15:00:00Z' }, 0.5, 64, 'after'],
    [{ phash: '0000000000000000', takenAt: '2026-03-01T15:00:00Z' }, 0.85, 0, 'before'],
    [{ phash: '0000000000000000', takenAt: null }, 0.925, 0, 'unknown'],
    [{ phash: null, takenAt: '2026-03-03T15:00:00Z' }, 0.75, null, 'after'],
    [{ phash: '0000000000000000', takenAt: '2026-03-03T15:00:00Z', area: 'brakes' as const }, 0.65, 0, 'after'],
  ])('case %#: score %f', (over, score, distance, order) => {
    const s = scorePair(before, shot({ id: 2, phase: 'after', ...over }));
    expect(s).not.toBeNull();
    expect(s!.score).toBeCloseTo(score, 6);
    expect(s!.distance).toBe(distance);
    expect(s!.order).toBe(order);
  });

  it('weights add up to 1', () => {
    expect(PAIR_WEIGHTS.area + PAIR_WEIGHTS.order + PAIR_WEIGHTS.framing).toBeCloseTo(1, 12);
  });

  it('returns null for a combination that cannot be a pair', () => {
    expect(scorePair(before, shot({ id: 2, phase: 'during' }))).toBeNull();
  });
});

describe('suggestPairs', () => {
  it('one-to-one picks come first even when a reused shot scores higher than a later pick', () => {
    // Before 1 fits after 3 best (0 bits) and after 4 well (8 bits); before 2 is 16 bits from either.
    const list = suggestPairs([
      shot({ id: 1, phash: '0000000000000000' }),
      shot({ id: 2, phash: 'ffff000000000000' }),
      shot({ id: 3, phase: 'after', phash: '0000000000000000', takenAt: '2026-03-03T15:00:00Z' }),
      shot({ id: 4, phase: 'after', phash: 'f00000000000000f', takenAt: '2026-03-03T15:00:00Z' }),
    ]);
    expect(list.map((s) => `${s.beforeId}>${s.afterId}${s.best ? '*' : ''}`)).toEqual(['1>3*', '2>4*', '1>4', '2>3']);
  });

  // Two drivetrain subjects: framing (hash) tells them apart, area alone cannot.
  const shots: PairShot[] = [
    shot({ id: 10, phash: 'f0f0f0f000000000' }), // chain before
    shot({ id: 11, phash: '0000000f0f0f0f0f', takenAt: '2026-03-02T09:05:00Z' }), // cassette before
    shot({ id: 20, phase: 'after', phash: 'f0f0f0f000000003', takenAt: '2026-03-03T15:00:00Z' }), // chain after
    shot({ id: 21, phase: 'after', phash: '0000000f0f0f0f0e', takenAt: '2026-03-03T15:02:00Z' }), // cassette after
    shot({ id: 30, phase: 'during', phash: 'f0f0f0f000000000', takenAt: '2026-03-03T10:00:00Z' }), // not pairable
    shot({ id: 40, phase: 'after', kind: 'video', phash: null, takenAt: '2026-03-03T15:05:00Z' }),
  ];

  it('ranks the true pairs first and leaves out during shots and videos', () => {
    const list = suggestPairs(shots);
    expect(list.slice(0, 2).map((s) => [s.beforeId, s.afterId, s.best])).toEqual([
      [11, 21, true],
      [10, 20, true],
    ]);
    expect(list.slice(2).every((s) => !s.best)).toBe(true);
    expect(list).toHaveLength(4);
    expect(list.every((s) => s.beforeId !== 30 && s.afterId !== 40)).toBe(true);
  });

  it('leaves out shots already in a pair', () => {
    const list = suggestPairs(shots, new Set([10, 20]));
    expect(list.map((s) => [s.beforeId, s.afterId])).toEqual([[11, 21]]);
  });
});
