import { Button, Card, Group, Loader, Stack, Text, TextInput, UnstyledButton } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconSearch, IconUserCheck, IconX } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { useCustomers } from '../api/customers';

interface Picked {
  id: number;
  label: string;
}

/** Type a few letters of the owner's name, phone or e-mail, then tap the right one. */
export function CustomerSearch({ selected, onPick, error }: { selected: Picked | null; onPick: (c: Picked | null) => void; error?: ReactNode }) {
  const [q, setQ] = useState('');
  const [debounced] = useDebouncedValue(q.trim(), 250);
  const results = useCustomers({ q: debounced, pageSize: 6, sort: 'name', order: 'asc' }, debounced.length >= 2 && !selected);
  if (selected) {
    return (
      <Group justify="space-between" wrap="nowrap">
        <Group gap="xs" wrap="nowrap">
          <IconUserCheck />
          <Text fw={700}>{selected.label}</Text>
        </Group>
        <Button variant="subtle" leftSection={<IconX size={18} />} onClick={() => onPick(null)}>
          Change
        </Button>
      </Group>
    );
  }
  return (
    <Stack gap="xs">
      <TextInput
        label="Find the owner"
        placeholder="A few letters of name, phone or e-mail"
        leftSection={<IconSearch size={18} />}
        rightSection={results.isFetching ? <Loader size="xs" /> : null}
        value={q}
        onChange={(e) => setQ(e.currentTarget.value)}
        error={error}
        autoComplete="off"
      />
      {results.data?.items.map((c) => (
        <UnstyledButton key={c.id} onClick={() => onPick({ id: c.id, label: c.name })}>
          <Card withBorder padding="sm" mih={52}>
            <Text fw={600}>{c.name}</Text>
            <Text size="sm" c="dimmed">
              {[c.phone, c.email].filter(Boolean).join(' · ') || 'No contact details'}
            </Text>
          </Card>
        </UnstyledButton>
      ))}
      {results.data && results.data.items.length === 0 && (
        <Text size="sm" c="dimmed">
          No customer matches “{debounced}”. Add them as a new customer.
        </Text>
      )}
    </Stack>
  );
}
