import { MantineProvider } from '@mantine/core';
import { fireEvent, render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { MeasurementForm } from './measurement-form';

const renderChain = (speeds: number) =>
  render(
    <MantineProvider theme={theme}>
      <MeasurementForm kind="chain_elongation" ctx={{ checkpointKey: 'chain_wear', lengthUnit: 'mm' }} speeds={speeds} />
    </MantineProvider>,
  );

describe('chain measurement live verdict', () => {
  // CHECKS.md B.1 arithmetic: 24 pitches × 12.7 mm = 304.8 mm; (306.74 − 304.8) / 304.8 = 0.636 %.
  it('shows the replace verdict for 306.74 mm over 24 pitches on an 11-speed bike', () => {
    renderChain(11);
    fireEvent.change(screen.getByLabelText('Length over those pitches'), { target: { value: '306.74' } });
    expect(screen.getByText('0.636 % elongation')).toBeTruthy();
    expect(screen.getByText(/Replace the chain\./)).toBeTruthy();
    expect(screen.getByText('Worn')).toBeTruthy();
  });

  it('reads the same chain as wearing, not worn, on a 10-speed bike (0.75 % limit)', () => {
    renderChain(10);
    fireEvent.change(screen.getByLabelText('Length over those pitches'), { target: { value: '306.74' } });
    expect(screen.getByText('Wearing')).toBeTruthy();
    expect(screen.getByText(/Check again at the next service/)).toBeTruthy();
  });

  it('explains a misread instead of a verdict', () => {
    renderChain(11);
    fireEvent.change(screen.getByLabelText('Length over those pitches'), { target: { value: '290' } });
    expect(screen.getByText(/shorter than 24 pitches/)).toBeTruthy();
  });
});
