import { QueryClient, QueryObserver } from '@tanstack/react-query';
import { ageText, oldestShown } from './data-age';

describe('age of the data shown offline', () => {
  it.each([
    [0, 'just now'],
    [59_999, 'just now'],
    [60_000, '1 min ago'],
    [59 * 60_000, '59 min ago'],
    [60 * 60_000, '1 h ago'],
    [23 * 3_600_000 + 59 * 60_000, '23 h ago'],
    [24 * 3_600_000, '1 day ago'],
    [3 * 24 * 3_600_000, '3 days ago'],
  ])('%i ms reads "%s"', (ms, text) => expect(ageText(ms)).toBe(text));

  it('is the oldest answer a mounted page reads, not the session nor a cached answer no page shows', () => {
    const qc = new QueryClient();
    qc.setQueryData(['session'], { id: 1 }, { updatedAt: 100 });
    qc.setQueryData(['jobs', 7], { id: 7 }, { updatedAt: 5_000 });
    qc.setQueryData(['media', 7], [], { updatedAt: 3_000 });
    qc.setQueryData(['jobs', 'list'], [], { updatedAt: 1_000 });
    expect(oldestShown(qc)).toBe(0);
    const watch = (key: unknown[]) => new QueryObserver(qc, { queryKey: key, enabled: false }).subscribe(() => undefined);
    const stops = [watch(['session']), watch(['jobs', 7]), watch(['media', 7])];
    expect(oldestShown(qc)).toBe(3_000);
    stops.forEach((stop) => stop());
  });
});
