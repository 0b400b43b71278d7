import { CONTACT_CHANNELS } from '@benchproof/contracts';
import { SegmentedControl, SimpleGrid, Stack, Text, Textarea, TextInput } from '@mantine/core';
import type { ReactNode } from 'react';

/** Mantine input props for one field (value, onChange, error, …). */
type FieldGetter = (name: 'name' | 'email' | 'phone' | 'preferredChannel' | 'notes') => object;

const CHANNEL_LABELS: Record<(typeof CONTACT_CHANNELS)[number], string> = { email: 'E-mail', phone: 'Phone call', sms: 'Text message' };

function ChannelPicker({ props }: { props: object }) {
  const { value, onChange, error } = props as { value: string; onChange: (v: string) => void; error?: ReactNode };
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500}>
        How they like to be reached
      </Text>
      <SegmentedControl
        fullWidth
        size="md"
        data={CONTACT_CHANNELS.map((c) => ({ value: c, label: CHANNEL_LABELS[c] }))}
        value={value}
        onChange={onChange}
        aria-label="Preferred channel"
      />
      {error && (
        <Text size="sm" c="red">
          {error}
        </Text>
      )}
    </Stack>
  );
}

/** Name and contact of a bike owner; used by the customer form and by booking-in. */
export function CustomerFields({ field }: { field: FieldGetter }) {
  return (
    <Stack gap="sm">
      <TextInput label="Name" autoComplete="off" withAsterisk {...field('name')} />
      <ChannelPicker props={field('preferredChannel')} />
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
        <TextInput label="Phone" type="tel" inputMode="tel" autoComplete="off" {...field('phone')} />
        <TextInput label="E-mail" type="email" inputMode="email" autoComplete="off" description="Reports and approval links go here" {...field('email')} />
      </SimpleGrid>
      <Textarea label="Notes" autosize minRows={2} {...field('notes')} />
    </Stack>
  );
}
