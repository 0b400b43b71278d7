import { FINAL_CHECK_ITEMS, FINAL_CHECK_ITEM_LABELS, failedFinalCheckItems } from './final-check';

describe('final check list (CHECKS.md A.2 step 8, common practice, no source)', () => {
  const allPass = Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, true]));

  it('passes only when every item passes', () => {
    expect(failedFinalCheckItems(allPass)).toEqual([]);
    expect(failedFinalCheckItems({ ...allPass, brakes: false, test_ride: false })).toEqual(['brakes', 'test_ride']);
  });

  it('counts a missing item as not passed', () => {
    const rest: Record<string, boolean> = { ...allPass };
    delete rest.steering;
    expect(failedFinalCheckItems(rest)).toEqual(['steering']);
  });

  it('labels every item', () => {
    for (const item of FINAL_CHECK_ITEMS) expect(FINAL_CHECK_ITEM_LABELS[item]).toMatch(/\w{4}/);
  });
});
