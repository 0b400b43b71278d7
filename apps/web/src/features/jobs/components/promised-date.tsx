import { Group, Text } from '@mantine/core';
import { IconAlarm } from '@tabler/icons-react';
import dayjs from 'dayjs';

/** The promised day; when overdue, an icon and the word "Overdue" say so, not colour alone. */
export function PromisedDate({ promisedOn, overdue, size = 'sm' }: { promisedOn: string | null; overdue: boolean; size?: 'sm' | 'md' }) {
  if (!promisedOn)
    return (
      <Text size={size} c="dimmed" span>
        No date promised
      </Text>
    );
  const day = dayjs(promisedOn).format('ddd D MMM YYYY');
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
