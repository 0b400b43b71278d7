import { CONDITIONS, contrastRatio, WCAG_THRESHOLDS } from '@benchproof/domain';
import { MantineProvider } from '@mantine/core';
import { render, screen } from '@testing-library/react';
import { theme } from '../app/theme';
import { ConditionBadge } from './condition-badge';
import { CONDITION_COLOURS } from './condition-colours';

describe('condition scale', () => {
  it.each(CONDITIONS)('%s colour reaches 3:1 against white (WCAG 2.2 SC 1.4.11)', (c) => {
    expect(contrastRatio(CONDITION_COLOURS[c], '#FFFFFF')).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.nonText);
  });

  it('uses four different colours', () => {
    expect(new Set(Object.values(CONDITION_COLOURS)).size).toBe(4);
  });

  it('draws a different shape for every step and says "do not ride" for unsafe', () => {
    const { container } = render(
      <MantineProvider theme={theme}>
        {CONDITIONS.map((c) => (
          <ConditionBadge key={c} condition={c} />
        ))}
      </MantineProvider>,
    );
    const shapes = [...container.querySelectorAll('svg')].map((svg) => svg.innerHTML);
    expect(new Set(shapes).size).toBe(4);
    expect(screen.getByText(/do not ride/i)).toBeTruthy();
  });
});
