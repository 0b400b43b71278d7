import { MantineProvider } from '@mantine/core';
import { cleanup, render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { DatesLocale } from '../../../lib/dates';
import { PromisedDate } from './promised-date';

// Expected strings: CLDR 48 via Node's Intl (en-GB "EEE, d MMM y", en-US "EEE, MMM d, y").
describe('the promised day on the jobs list, in the shop’s locale', () => {
  afterEach(cleanup);
  it.each([
    ['en-GB', 'Tue, 1 Dec 2026'],
    ['en-US', 'Tue, Dec 1, 2026'],
  ])('%s shows %s, the same day in every zone', (locale, text) => {
    render(
      <MantineProvider theme={theme}>
        <DatesLocale locale={locale}>
          <PromisedDate promisedOn="2026-12-01" overdue={false} />
        </DatesLocale>
      </MantineProvider>,
    );
    expect(screen.getByText(text)).toBeTruthy();
  });
});
