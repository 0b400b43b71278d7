import { NumberInput, SegmentedControl, Select, SimpleGrid, Stack, Text, TextInput, useMatches } from '@mantine/core';
import type { ReactNode } from 'react';
import { BRAKE_OPTIONS, DROPOUT_OPTIONS, FRAME_OPTIONS, ROUTING_OPTIONS } from './spec-labels';

type Field =
  | 'maker'
  | 'model'
  | 'year'
  | 'frameMaterial'
  | 'size'
  | 'colour'
  | 'serialNumber'
  | 'drivetrainSpeeds'
  | 'brakeType'
  | 'cableRouting'
  | 'dropoutType'
  | 'tyreSize';
/** Mantine input props for one field (value, onChange, error, …). */
type FieldGetter = (name: Field) => object;

/** At least 44 px per choice, for gloved or greasy fingers at the counter. */
const TARGET = { label: { minHeight: 44, display: 'flex', alignItems: 'center', justifyContent: 'center' } } as const;

function Segmented({ label, data, props }: { label: string; data: { value: string; label: string }[]; props: object }) {
  const { error, value, onChange } = props as { error?: ReactNode; value: string; onChange: (v: string) => void };
  // Three long choices do not fit side by side on a phone: stack them there.
  const narrow = useMatches({ base: true, sm: false });
  const vertical = narrow && data.length > 2;
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500}>
        {label}
      </Text>
      <SegmentedControl
        fullWidth
        size="md"
        orientation={vertical ? 'vertical' : 'horizontal'}
        data={data}
        value={value}
        onChange={onChange}
        aria-label={label}
        styles={TARGET}
      />
      {error && (
        <Text size="sm" c="red">
          {error}
        </Text>
      )}
    </Stack>
  );
}

/** Every spec of a bike; the drivetrain speed count and brake type drive the inspection computations. */
export function BikeSpecFields({ field }: { field: FieldGetter }) {
  return (
    <Stack gap="sm">
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
        <TextInput label="Maker" withAsterisk autoComplete="off" {...field('maker')} />
        <TextInput label="Model" withAsterisk autoComplete="off" {...field('model')} />
        <NumberInput label="Year" inputMode="numeric" allowDecimal={false} min={1900} max={2100} hideControls {...field('year')} />
        <NumberInput
          label="Drivetrain speeds"
          description="Rear sprockets; 1 = single speed"
          inputMode="numeric"
          allowDecimal={false}
          min={1}
          max={13}
          withAsterisk
          {...field('drivetrainSpeeds')}
        />
        <Select label="Frame material" data={FRAME_OPTIONS} allowDeselect={false} {...field('frameMaterial')} />
        <TextInput label="Size" placeholder="e.g. 56, M" {...field('size')} />
        <TextInput label="Colour" {...field('colour')} />
        <TextInput label="Serial number" autoComplete="off" {...field('serialNumber')} />
        <TextInput label="Tyre size" placeholder="e.g. 28-622" description="ISO size printed on the tyre sidewall" autoComplete="off" {...field('tyreSize')} />
      </SimpleGrid>
      <Segmented label="Brakes" data={BRAKE_OPTIONS} props={field('brakeType')} />
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
        <Segmented label="Cable routing" data={ROUTING_OPTIONS} props={field('cableRouting')} />
        <Segmented label="Dropouts" data={DROPOUT_OPTIONS} props={field('dropoutType')} />
      </SimpleGrid>
    </Stack>
  );
}
