import type { OutboxStatus } from '@benchproof/contracts';
import { Badge } from '@mantine/core';
import { IconAlertTriangle, IconCheck, IconClockHour4, IconSend } from '@tabler/icons-react';

/** Colour, icon and word together, so the status reads in greyscale and for colour-blind eyes. */
const LOOK: Record<OutboxStatus, { label: string; color: string; icon: typeof IconCheck }> = {
  queued: { label: 'Waiting to send', color: 'gray', icon: IconClockHour4 },
  sending: { label: 'Sending', color: 'blue', icon: IconSend },
  sent: { label: 'Delivered to mail server', color: 'teal', icon: IconCheck },
  failed: { label: 'Not delivered', color: 'red', icon: IconAlertTriangle },
};

export function MessageStatus({ status }: { status: OutboxStatus }) {
  const { label, color, icon: Icon } = LOOK[status];
  return (
    <Badge
      color={color}
      variant={status === 'failed' ? 'filled' : 'light'}
      size="lg"
      radius="sm"
      leftSection={<Icon size={14} />}
      style={{ textTransform: 'none' }}
    >
      {label}
    </Badge>
  );
}
