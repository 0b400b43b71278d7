import { Group, Text } from '@mantine/core';
import { IconAlarm } from '@tabler/icons-react';
import { useDates } from '../../../lib/dates';

/** The promised day; when overdue, an icon and the word "Overdue" say so, not colour alone. */
export function PromisedDate({ promisedOn, overdue, size = 'sm' }: { promisedOn: string | null; overdue: boolean; size?: 'sm' | 'md' }) {
  const dates = useDates();
  if (!promisedOn)
    return (
      <Text size={size} c="dimmed" span>
        No date promised
      </Text>
    );
  const day = dates.weekday(promisedOn);
  if (!overdue)
    return (
      <Text size={size} span>
        {day}
      </Text>
    );
  return (
    <Group gap={4} wrap="nowrap" component="span" style={{ display: 'inline-flex' }}>
      <IconAlarm size={18} color="var(--mantine-color-red-8)" aria-hidden />
      <Text size={size} fw={700} c="red.8" span>
        Overdue · {day}
      </Text>
    </Group>
  );
}
