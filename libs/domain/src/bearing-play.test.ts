import { BEARINGS, BEARING_PLAY_GRADES, bearingPlayVerdict } from './bearing-play';
import { DEFAULT_CHECKPOINTS } from './checkpoints';
import * as domain from './index';

describe('bearingPlayVerdict: categorical, no numeric standard (ISO 4210-2 4.7.5; CHECKS.md B.10)', () => {
  it.each([
    { grade: 'none', condition: 'sound', verdict: 'none' },
    { grade: 'slight', condition: 'wearing', verdict: 'adjust' },
    { grade: 'marked', condition: 'worn', verdict: 'adjust_or_replace' },
  ] as const)('$grade → $condition', ({ grade, condition, verdict }) => {
    for (const bearing of BEARINGS) {
      const r = bearingPlayVerdict(grade, bearing);
      expect(r.condition).toBe(condition);
      expect(r.verdict).toBe(verdict);
    }
  });

  it('names the trade check (common practice, no source)', () => {
    expect(bearingPlayVerdict('slight', 'headset').message).toContain('rock the bike with the front brake on');
    expect(bearingPlayVerdict('none', 'bottom_bracket').message).toContain('rock the crank arms');
  });

  it('keeps a dial gauge reading for comparison but never grades by it', () => {
    const small = bearingPlayVerdict('marked', 'front_hub', 0.01);
    const large = bearingPlayVerdict('none', 'front_hub', 0.5);
    expect(small.condition).toBe('worn');
    expect(large.condition).toBe('sound');
    expect(large.message).toContain('recorded for comparison only');
  });

  it('exports no millimetre play limit anywhere', () => {
    const names = Object.keys(domain);
    expect(names.filter((n) => /PLAY.*(MM|LIMIT)|BEARING.*(MM|LIMIT)/i.test(n))).toEqual([]);
    expect(BEARING_PLAY_GRADES).toEqual(['none', 'slight', 'marked']);
    const bearingCheckpoints = DEFAULT_CHECKPOINTS.filter((c) => c.area === 'bearings');
    expect(bearingCheckpoints.every((c) => c.measurementKinds.join() === 'bearing_play')).toBe(true);
  });
});
