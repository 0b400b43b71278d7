import { MEASUREMENT_KINDS } from './inspection-areas';
import { MEASUREMENT_PLAIN_WORDS } from './owner-explanations';

describe('plain words for owners', () => {
  it('explain every measurement kind in one sentence or two, without bench jargon codes', () => {
    for (const kind of MEASUREMENT_KINDS) {
      const text = MEASUREMENT_PLAIN_WORDS[kind];
      expect(text.length).toBeGreaterThan(40);
      expect(text.length).toBeLessThan(200);
      expect(text).not.toMatch(/_/);
    }
  });

  it('tells the owner what chain stretch costs them', () => {
    expect(MEASUREMENT_PLAIN_WORDS.chain_elongation).toMatch(/cassette/);
  });
});
