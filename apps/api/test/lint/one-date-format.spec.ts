import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';

const ROOT = resolve(__dirname, '../../../..');
/** The one place dates are written for people (libs/domain dates.ts, driven by the shop's locale). */
const HELPER = 'libs/domain/src/dates.ts';
const SOURCES = ['apps/web/src', 'apps/api/src', 'libs/contracts/src', 'libs/domain/src'];

function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return files(p);
    return /\.tsx?$/.test(e.name) && !/\.(test|spec)\.tsx?$/.test(e.name) ? [p] : [];
  });
}

/**
 * Ways to write a date for a reader without the shop's locale: the runtime's own locale
 * (toLocale…String on a date), a fixed Intl formatter, or a dayjs display pattern. Machine
 * formats (ISO days for inputs and requests) are fine.
 */
const BYPASSES = [
  /\.toLocaleDateString\(/,
  /\.toLocaleTimeString\(/,
  /new Date\([^)]*\)\.toLocaleString\(/,
  /new Intl\.DateTimeFormat\(/,
  /dayjs\([^)]*\)\.format\('(?!YYYY-MM-DD(?: HH:mm:ss)?')/,
];

describe('every date a person reads goes through the one locale-driven helper', { timeout: 60_000 }, () => {
  it('no web, API (PDF, e-mail) or contract source writes a date any other way', () => {
    const hits = SOURCES.flatMap((d) => files(resolve(ROOT, d)))
      .filter((f) => relative(ROOT, f) !== HELPER)
      .flatMap((f) =>
        readFileSync(f, 'utf8')
          .split('\n')
          .map((line, i) => ({ line, i }))
          .filter(({ line }) => BYPASSES.some((b) => b.test(line)))
          .map(({ line, i }) => `${relative(ROOT, f)}:${i + 1}: ${line.trim().slice(0, 90)}`),
      );
    expect(hits).toEqual([]);
  });

  it('the patterns catch the forms they are for', () => {
    const caught = (s: string) => BYPASSES.some((b) => b.test(s));
    expect(caught('new Date(page.expiresAt).toLocaleDateString()')).toBe(true);
    expect(caught("dayjs(e.at).format('D MMM HH:mm')")).toBe(true);
    expect(caught("dayjs().format('YYYY-MM-DD')")).toBe(false);
  });
});
