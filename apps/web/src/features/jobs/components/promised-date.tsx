import { Group, Text } from '@mantine/core';
import { IconAlarm } from '@tabler/icons-react';

const DAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/**
 * A calendar day "2026-12-01" as "Tue 1 Dec 2026" (dayjs's 'ddd D MMM YYYY'). The day as written, with no
 * time zone involved; a few lines instead of dayjs because it sits on the jobs list's first screen.
 */
export function formatDay(isoDay: string): string {
  const [y, m, d] = isoDay.split('-').map(Number);
  return `${DAYS[new Date(Date.UTC(y, m - 1, d)).getUTCDay()]} ${d} ${MONTHS[m - 1]} ${y}`;
}

/** The promised day; when overdue, an icon and the word "Overdue" say so, not colour alone. */
export function PromisedDate({ promisedOn, overdue, size = 'sm' }: { promisedOn: string | null; overdue: boolean; size?: 'sm' | 'md' }) {
  if (!promisedOn)
    return (
      <Text size={size} c="dimmed" span>
        No date promised
      </Text>
    );
  const day = formatDay(promisedOn);
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
