import { JOB_STATUS_LABELS, type JobStatus } from '@benchproof/domain';
import { Badge, type BadgeProps } from '@mantine/core';

const STATUS_COLOURS: Readonly<Record<JobStatus, string>> = {
  booked_in: 'gray',
  on_stand: 'bench',
  waiting_owner: 'brass',
  in_work: 'indigo',
  final_check: 'grape',
  ready: 'teal',
  collected: 'dark',
  cancelled: 'red',
};

/** Status as words (the colour is only a help). */
export function JobStatusBadge({ status, ...rest }: { status: JobStatus } & Omit<BadgeProps, 'children' | 'color'>) {
  return (
    <Badge color={STATUS_COLOURS[status]} variant={status === 'collected' || status === 'cancelled' ? 'outline' : 'light'} radius="sm" {...rest}>
      {JOB_STATUS_LABELS[status]}
    </Badge>
  );
}
