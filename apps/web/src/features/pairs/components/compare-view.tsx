import type { MediaAssetDto, PairCrop } from '@benchproof/contracts';
import { SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { CompareSlider } from './compare-slider';
import { CroppedShot } from './cropped-shot';

type Mode = 'slider' | 'side';

/** A pair as the owner will see it: a draggable before/after slider, or both side by side. */
export function CompareView({ before, after, crop, caption }: { before: MediaAssetDto; after: MediaAssetDto; crop: PairCrop | null; caption: string }) {
  const [mode, setMode] = useState<Mode>('slider');
  return (
    <Stack gap="xs">
      <Text fw={600} lineClamp={2}>
        {caption || 'Before and after'}
      </Text>
      <SegmentedControl
        fullWidth
        size="md"
        value={mode}
        onChange={(v) => setMode(v)}
        data={[
          { value: 'slider', label: 'Slider' },
          { value: 'side', label: 'Side by side' },
        ]}
        aria-label="How to compare"
      />
      {mode === 'slider' ? (
        <CompareSlider before={before} after={after} crop={crop} />
      ) : (
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="xs" data-testid="side-by-side">
          <Stack gap={4}>
            <Text size="sm" fw={700}>
              Before
            </Text>
            <CroppedShot asset={before} crop={crop} alt="Before" />
          </Stack>
          <Stack gap={4}>
            <Text size="sm" fw={700}>
              After
            </Text>
            <CroppedShot asset={after} crop={crop} alt="After" />
          </Stack>
        </SimpleGrid>
      )}
    </Stack>
  );
}
