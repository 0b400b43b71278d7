import type { TorqueEntryDto } from '@benchproof/contracts';
import { TORQUE_CAUTION } from '@benchproof/domain';
import { MantineProvider } from '@mantine/core';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { workLogKeys } from '../api/work-log';
import { TorqueEntries } from './torque-entries';

function entry(id: number, patch: Partial<TorqueEntryDto>): TorqueEntryDto {
  return {
    id,
    fastener: `Bolt ${id}`,
    specified: { min: 5, max: null, unit: 'nm' },
    applied: { value: 5, unit: 'nm' },
    tolerancePct: 6,
    specSource: 'Printed on the stem',
    tool: 'TW-02',
    toolCalibratedOn: null,
    calibrationOverdue: false,
    threadlocker: null,
    carbonPart: false,
    verdict: 'within',
    withinTolerance: true,
    deviationPct: 0,
    appliedNm: 5,
    lowNm: 4.7,
    highNm: 5.3,
    message: 'Within',
    cautions: [TORQUE_CAUTION],
    userId: 1,
    userName: 'Ines',
    at: '2025-06-01T10:00:00.000Z',
    ...patch,
  };
}

function renderLog(entries: TorqueEntryDto[]) {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity, retry: false } } });
  qc.setQueryData(workLogKeys.torque(1), entries);
  return render(
    <QueryClientProvider client={qc}>
      <MantineProvider theme={theme}>
        <TorqueEntries jobId={1} />
      </MantineProvider>
    </QueryClientProvider>,
  );
}

describe('torque log: wrench calibration and threadlocker', () => {
  it('shows the calibration date and threadlocker in plain words, with the torque caution', () => {
    renderLog([entry(1, { toolCalibratedOn: '2025-03-10', threadlocker: 'blue_medium' })]);
    expect(screen.getByText(/calibrated 10 Mar 2025/)).toBeTruthy();
    expect(screen.getByText(/threadlocker: medium strength \(blue/)).toBeTruthy();
    expect(screen.getByText(TORQUE_CAUTION)).toBeTruthy();
    expect(screen.queryByText(/wrench calibration older than 12 months/i)).toBeNull();
  });

  // ISO 6789-1:2017 12-month recalibration interval, from memory (CHECKS.md B.4 [M]); the server sets the flag.
  it('warns when the wrench calibration is older than 12 months, on that entry only', () => {
    renderLog([entry(1, { toolCalibratedOn: '2024-01-05', calibrationOverdue: true }), entry(2, {})]);
    expect(screen.getAllByText(/wrench calibration older than 12 months/i)).toHaveLength(1);
    const card = screen.getByText('Bolt 1').closest('.mantine-Card-root') as HTMLElement;
    expect(within(card).getByText(/wrench calibration older than 12 months/i)).toBeTruthy();
    expect(screen.getByText(/calibration date not recorded · threadlocker not recorded/)).toBeTruthy();
  });

  it('offers the threadlocker kinds and the calibration date as form fields', () => {
    renderLog([]);
    expect(screen.getAllByLabelText('Threadlocker').length).toBeGreaterThan(0);
    expect(screen.getByText('Wrench calibrated on')).toBeTruthy();
  });
});
