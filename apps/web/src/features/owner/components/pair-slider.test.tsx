import type { OwnerPair } from '@benchproof/contracts';
import { MantineProvider, Modal } from '@mantine/core';
import { render, screen } from '@testing-library/react';
import { theme } from '../../../app/theme';
import { PairSlider } from './pair-slider';

const shot = (id: number) => ({ id, caption: '', width: 800, height: 600, thumbUrl: `/t/${id}`, screenUrl: `/s/${id}` });
const pair = (caption: string): OwnerPair => ({ id: 1, caption, before: shot(1), after: shot(2) });

const showPair = (caption: string) =>
  render(
    <MantineProvider theme={theme}>
      <PairSlider pair={pair(caption)} />
    </MantineProvider>,
  );

describe('accessible names on the owner page', () => {
  it('names an uncaptioned pair "Before photo", never "Before: " with nothing after it, and names the slider', () => {
    showPair('');
    expect(screen.getByRole('img', { name: 'Before photo' })).toBeTruthy();
    expect(screen.getByRole('img', { name: 'After photo' })).toBeTruthy();
    expect(screen.getByRole('slider', { name: 'Before and after: photos' })).toBeTruthy();
  });

  it('names a captioned pair by its caption', () => {
    showPair('Rear brake pads');
    expect(screen.getByRole('img', { name: 'Before: Rear brake pads' })).toBeTruthy();
    expect(screen.getByRole('slider', { name: 'Before and after: Rear brake pads' })).toBeTruthy();
  });

  it('gives every modal close button the name "Close" through the theme', () => {
    render(
      <MantineProvider theme={theme}>
        <Modal opened onClose={() => undefined} title="A dialog">
          body
        </Modal>
      </MantineProvider>,
    );
    expect(screen.getByRole('button', { name: 'Close' })).toBeTruthy();
  });
});
