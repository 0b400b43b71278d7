/**
 * The final-check list before a bike is marked ready (CHECKS.md A.2 step 8,
 * common practice, no source). Every item must pass.
 */
export const FINAL_CHECK_ITEMS = [
  'brakes',
  'shifting',
  'steering',
  'fasteners_torqued',
  'wheels_true_centred',
  'tyres_pressure',
  'axles_closed',
  'test_ride',
] as const;
export type FinalCheckItem = (typeof FINAL_CHECK_ITEMS)[number];

export const FINAL_CHECK_ITEM_LABELS: Readonly<Record<FinalCheckItem, string>> = {
  brakes: 'Brakes work, front and rear',
  shifting: 'Shifting clean across the range',
  steering: 'Steering free, no play',
  fasteners_torqued: "Bolts torqued to the maker's values",
  wheels_true_centred: 'Wheels centred and true',
  tyres_pressure: 'Tyres at pressure',
  axles_closed: 'Quick-releases / thru-axles closed',
  test_ride: 'Short test ride done',
};

/** The items that did not pass, in list order; an item missing from `results` counts as not passed. */
export function failedFinalCheckItems(results: Partial<Record<FinalCheckItem, boolean>>): FinalCheckItem[] {
  return FINAL_CHECK_ITEMS.filter((item) => results[item] !== true);
}
