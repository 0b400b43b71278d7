import type { OwnerPair } from '@benchproof/contracts';
import { Slider, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import classes from './owner.module.css';

/** Before and after of the same spot, one over the other; the slider (or a drag on it) moves the split. */
export function PairSlider({ pair }: { pair: OwnerPair }) {
  const [split, setSplit] = useState(50);
  // a pair without a caption is named "Before photo", never "Before: " with nothing after it
  const what = pair.caption.trim();
  return (
    <Stack gap={6} data-testid="pair-slider">
      <div className={classes.slider}>
        <img src={pair.before.screenUrl} alt={what ? `Before: ${what}` : 'Before photo'} loading="lazy" decoding="async" />
        <div className={classes.sliderAfter} style={{ clipPath: `inset(0 0 0 ${split}%)` }}>
          <img src={pair.after.screenUrl} alt={what ? `After: ${what}` : 'After photo'} loading="lazy" decoding="async" />
        </div>
        <div className={classes.sliderHandle} style={{ left: `${split}%` }} />
      </div>
      <Slider value={split} onChange={setSplit} size="xl" label={null} thumbLabel={`Before and after: ${what || 'photos'}`} />
      <Text size="sm" c="dimmed">
        Left: before · Right: after{pair.caption ? ` — ${pair.caption}` : ''}
      </Text>
    </Stack>
  );
}
