import { roleCan } from '@benchproof/contracts';
import { Stack } from '@mantine/core';
import { FinalCheckPanel } from '../../../../features/jobs';
import { TorqueEntries, WorkEntries } from '../../../../features/work-log';
import { useStaff } from '../../staff';
import type { SectionProps } from './section-props';

export default function WorkSection({ job, me, frozen }: SectionProps) {
  const { checkers } = useStaff();
  return (
    <Stack gap="xl">
      <WorkEntries jobId={job.id} canRecord={roleCan(me.role, 'work_log.record') && !frozen} />
      <TorqueEntries jobId={job.id} canRecord={roleCan(me.role, 'work_log.record') && !frozen} />
      <FinalCheckPanel job={job} me={me} checkers={checkers} />
    </Stack>
  );
}
