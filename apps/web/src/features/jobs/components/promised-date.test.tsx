import dayjs from 'dayjs';
import { formatDay } from './promised-date';

// Reference: dayjs's own 'ddd D MMM YYYY' (the format the jobs list used before), parsing the day as local time.
describe('the promised day on the jobs list', () => {
  it('reads like dayjs for every day of two years, leap day and year ends included', () => {
    const start = dayjs('2027-01-01');
    for (let i = -366; i < 365; i++) {
      const day = start.add(i, 'day');
      expect(formatDay(day.format('YYYY-MM-DD'))).toBe(day.format('ddd D MMM YYYY'));
    }
  });

  it('names the weekday of a fixed date', () => {
    expect(formatDay('2026-12-01')).toBe('Tue 1 Dec 2026');
    expect(formatDay('2028-02-29')).toBe('Tue 29 Feb 2028');
  });
});
