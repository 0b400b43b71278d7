import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS, MEDIA_PHASE_LABELS } from '@benchproof/domain';
import { SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { PhaseGroup } from './grouping';
import { MediaTile } from './media-tile';

interface Props {
  groups: PhaseGroup[];
  selected: Set<number>;
  onSelect: (id: number, on: boolean) => void;
  onOpen: (asset: MediaAssetDto) => void;
}

/** Thumbnails grouped by phase, then by area. */
export function MediaGrid({ groups, selected, onSelect, onOpen }: Props) {
  return (
    <Stack gap="lg">
      {groups.map((g) => (
        <Stack key={g.phase} gap="sm" component="section" aria-label={MEDIA_PHASE_LABELS[g.phase]}>
          <Title order={4}>{MEDIA_PHASE_LABELS[g.phase]}</Title>
          {g.areas.map((a) => (
            <Stack key={a.area} gap={6}>
              <Text size="sm" fw={600} c="dimmed">{`${MEDIA_AREA_LABELS[a.area]} · ${a.assets.length}`}</Text>
              <SimpleGrid cols={{ base: 3, xs: 4, sm: 5, md: 6, lg: 8 }} spacing={8}>
                {a.assets.map((asset) => (
                  <MediaTile
                    key={asset.id}
                    asset={asset}
                    selected={selected.has(asset.id)}
                    onSelect={(on) => onSelect(asset.id, on)}
                    onOpen={() => onOpen(asset)}
                  />
                ))}
              </SimpleGrid>
            </Stack>
          ))}
        </Stack>
      ))}
    </Stack>
  );
}
