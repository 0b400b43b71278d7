import type { CustomerDto } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { CustomerCard } from './customer-card';

const customer = (patch: Partial<CustomerDto>): CustomerDto => ({
  ...{ id: 4, name: 'Wren Halloway', email: 'wren@example.test', phone: '+61491570156', preferredChannel: 'sms', notes: null },
  ...{ createdAt: '2026-03-01T09:00:00.000Z', textsStoppedAt: null },
  ...patch,
});

const show = (c: CustomerDto) =>
  render(
    <MantineProvider theme={theme}>
      <CustomerCard customer={c} />
    </MantineProvider>,
  );

describe('customer card', () => {
  it('tells desk the customer replied STOP, and when, so they know why no text went', () => {
    show(customer({ textsStoppedAt: '2026-03-02T10:05:00.000Z' }));
    const notice = screen.getByTestId('texts-stopped');
    expect(notice.textContent).toMatch(/Replied STOP to our texts on .*2026/);
    expect(notice.textContent).toContain('until they reply START');
  });

  it('says nothing about texts for a customer who did not', () => {
    show(customer({}));
    expect(screen.queryByTestId('texts-stopped')).toBeNull();
  });
});
