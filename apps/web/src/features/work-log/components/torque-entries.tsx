import { CARBON_CAUTION, formatTorque, TORQUE_CAUTION } from '@benchproof/domain';
import { Badge, Card, Group, Stack, Text, Title } from '@mantine/core';
import dayjs from 'dayjs';
import { QueryState } from '../../../components/query-state';
import { SafetyNote } from '../../../components/safety-note';
import { useTorqueEntries } from '../api/work-log';
import { TorqueForm } from './torque-form';

const VERDICT = { within: { label: 'Within spec', colour: 'teal' }, under: { label: 'Under', colour: 'orange' }, over: { label: 'Over', colour: 'red' } } as const;

/** The torque log with its cautions always in view. */
export function TorqueEntries({ jobId }: { jobId: number }) {
  const entries = useTorqueEntries(jobId);
  return (
    <Stack>
      <Title order={3} size="h4">Torque</Title>
      <SafetyNote title="Torque" text={TORQUE_CAUTION} />
      <SafetyNote title="Carbon parts" text={CARBON_CAUTION} />
      <QueryState isLoading={entries.isLoading} error={entries.error} />
      {entries.data?.map((e) => (
        <Card key={e.id} withBorder padding="sm">
          <Group justify="space-between" wrap="nowrap">
            <Text fw={700}>{e.fastener}</Text>
            <Badge color={VERDICT[e.verdict].colour} variant="filled" radius="sm">{VERDICT[e.verdict].label}</Badge>
          </Group>
          <Text size="sm">
            Maker {e.specified.max ? `${e.specified.min}–${formatTorque(e.specified.max, e.specified.unit)}` : formatTorque(e.specified.min, e.specified.unit)} · applied {formatTorque(e.applied.value, e.applied.unit)}
            {e.carbonPart && ' · carbon part'}
          </Text>
          <Text size="xs" c="dimmed">Source: {e.specSource}{e.tool && ` · ${e.tool}`} · {e.userName ?? 'someone'} · {dayjs(e.at).format('D MMM HH:mm')}</Text>
        </Card>
      ))}
      <Card withBorder padding="md" bg="gray.0"><TorqueForm jobId={jobId} /></Card>
    </Stack>
  );
}
