import type { EstimateDto } from '@benchproof/contracts';
import { DECLINED_SAFETY_NOTICE } from '@benchproof/domain';
import { MantineProvider } from '@mantine/core';
import { render, screen, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { EstimateItems } from './estimate-items';

const totals = { partsMinor: 0, labourMinor: 3000, netMinor: 3000, taxMinor: 600, grossMinor: 3600 };

function item(
  id: number,
  summary: string,
  urgency: 'safety' | 'soon' | 'advisory',
  decisionStatus: 'pending' | 'approved' | 'declined',
  condition: 'sound' | 'wearing' | 'worn' | 'unsafe' = 'worn',
) {
  return {
    id,
    jobId: 1,
    checkpointId: null,
    area: 'brakes' as const,
    condition,
    description: summary,
    doNotRide: condition === 'unsafe',
    cautions: [],
    createdAt: '2025-01-01T10:00:00.000Z',
    updatedAt: '2025-01-01T10:00:00.000Z',
    recommendation: {
      id,
      findingId: id,
      summary,
      urgency,
      parts: [],
      labourHundredths: 50,
      labourRateMinor: 6000,
      taxRateBp: 2000,
      currency: 'GBP',
      totals,
      decisionStatus,
      decisions: [],
      updatedAt: '2025-01-01T10:00:00.000Z',
    },
  };
}

const renderItems = (items: EstimateDto['items']) =>
  render(
    <MantineProvider theme={theme}>
      <EstimateItems estimate={{ jobId: 1, currency: 'GBP', items, totals: { all: totals, approved: totals, pending: totals, declined: totals } }} />
    </MantineProvider>,
  );

describe('estimate lines by urgency (CHECKS.md A.2 step 4)', () => {
  it('groups lines under safety-critical, recommended soon and advisory, most urgent first', () => {
    renderItems([item(1, 'Bar tape', 'advisory', 'pending', 'wearing'), item(2, 'Rear pads', 'soon', 'approved'), item(3, 'Front pads', 'safety', 'pending')]);
    const groups = screen.getAllByRole('group');
    expect(groups.map((g) => g.getAttribute('aria-label'))).toEqual(['Safety-critical', 'Recommended soon', 'Advisory']);
    expect(within(groups[0]).getByText('Front pads')).toBeTruthy();
    expect(within(groups[2]).getByText('Bar tape')).toBeTruthy();
    expect(screen.queryByText(DECLINED_SAFETY_NOTICE)).toBeNull();
  });

  it('prints the declined-safety notice for a declined safety-critical line only', () => {
    renderItems([item(1, 'Front pads', 'safety', 'declined', 'wearing'), item(2, 'Rear tyre', 'advisory', 'declined', 'wearing')]);
    expect(screen.getAllByText(DECLINED_SAFETY_NOTICE)).toHaveLength(1);
    expect(within(screen.getByRole('group', { name: 'Safety-critical' })).getByText(DECLINED_SAFETY_NOTICE)).toBeTruthy();
  });
});
