import type { OwnerPair } from '@benchproof/contracts';
import { Slider, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import classes from './owner.module.css';

/** Before and after of the same spot, one over the other; the slider (or a drag on it) moves the split. */
export function PairSlider({ pair }: { pair: OwnerPair }) {
  const [split, setSplit] = useState(50);
  return (
    <Stack gap={6} data-testid="pair-slider">
      <div className={classes.slider}>
        <img src={pair.before.screenUrl} alt={`Before: ${pair.caption}`} loading="lazy" decoding="async" />
        <div className={classes.sliderAfter} style={{ clipPath: `inset(0 0 0 ${split}%)` }}>
          <img src={pair.after.screenUrl} alt={`After: ${pair.caption}`} loading="lazy" decoding="async" />
        </div>
        <div className={classes.sliderHandle} style={{ left: `${split}%` }} />
      </div>
      <Slider value={split} onChange={setSplit} size="xl" thumbSize={32} label={null} aria-label={`Before and after: ${pair.caption}`} />
      <Text size="sm" c="dimmed">
        Left: before · Right: after{pair.caption ? ` — ${pair.caption}` : ''}
      </Text>
    </Stack>
  );
}
