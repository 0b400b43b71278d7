import { URGENCY_LABELS, type Urgency } from '@benchproof/domain';
import { Badge } from '@mantine/core';
import { IconAlertOctagon, IconClock, IconInfoCircle } from '@tabler/icons-react';

/** Colour AND icon per urgency, so it still reads in greyscale print. */
const STYLE: Record<Urgency, { colour: string; Icon: typeof IconInfoCircle }> = {
  safety: { colour: 'red', Icon: IconAlertOctagon },
  soon: { colour: 'orange', Icon: IconClock },
  advisory: { colour: 'gray', Icon: IconInfoCircle },
};

export function UrgencyBadge({ urgency }: { urgency: Urgency }) {
  const { colour, Icon } = STYLE[urgency];
  return (
    <Badge color={colour} variant="outline" radius="sm" leftSection={<Icon size={14} aria-hidden />}>
      {URGENCY_LABELS[urgency]}
    </Badge>
  );
}
