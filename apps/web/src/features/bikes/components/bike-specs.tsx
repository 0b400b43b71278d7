import type { BikeDto } from '@benchproof/contracts';
import { SimpleGrid, Stack, Text } from '@mantine/core';
import { BRAKE_TYPE_LABELS, CABLE_ROUTING_LABELS, DROPOUT_TYPE_LABELS, FRAME_MATERIAL_LABELS } from './spec-labels';

function Spec({ label, value }: { label: string; value: string }) {
  return (
    <Stack gap={0}>
      <Text size="xs" tt="uppercase" c="dimmed" fw={700}>
        {label}
      </Text>
      <Text>{value || '—'}</Text>
    </Stack>
  );
}

/** The bike's specs as a compact grid. */
export function BikeSpecs({ bike }: { bike: BikeDto }) {
  return (
    <Stack gap="sm">
      <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="sm">
        <Spec label="Maker" value={bike.maker} />
        <Spec label="Model" value={bike.model} />
        <Spec label="Year" value={bike.year ? String(bike.year) : ''} />
        <Spec label="Frame" value={FRAME_MATERIAL_LABELS[bike.frameMaterial]} />
        <Spec label="Size" value={bike.size ?? ''} />
        <Spec label="Colour" value={bike.colour ?? ''} />
        <Spec label="Serial number" value={bike.serialNumber ?? ''} />
        <Spec label="Speeds" value={bike.drivetrainSpeeds === 1 ? 'Single speed' : `${bike.drivetrainSpeeds}-speed`} />
        <Spec label="Brakes" value={BRAKE_TYPE_LABELS[bike.brakeType]} />
        <Spec label="Cable routing" value={CABLE_ROUTING_LABELS[bike.cableRouting]} />
        <Spec label="Dropouts" value={DROPOUT_TYPE_LABELS[bike.dropoutType]} />
        <Spec label="Tyre size" value={bike.tyreSize ?? ''} />
      </SimpleGrid>
    </Stack>
  );
}
