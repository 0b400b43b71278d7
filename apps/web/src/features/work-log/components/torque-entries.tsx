import type { TorqueEntryDto } from '@benchproof/contracts';
import { CARBON_CAUTION, formatTorque, THREADLOCKER_LABELS, TORQUE_CAUTION } from '@benchproof/domain';
import { Badge, Card, Group, Stack, Text, Title } from '@mantine/core';
import { QueryState } from '../../../components/query-state';
import { SafetyNote } from '../../../components/safety-note';
import { useTorqueEntries } from '../api/work-log';
import { CalibrationNotice } from './calibration-notice';
import { TorqueForm } from './torque-form';
import { useDates } from '../../../lib/dates';

const VERDICT = {
  within: { label: 'Within spec', colour: 'teal' },
  under: { label: 'Under', colour: 'orange' },
  over: { label: 'Over', colour: 'red' },
} as const;

/** The wrench and its calibration, the threadlocker, as the log shows them. */
function ToolLine({ e }: { e: TorqueEntryDto }) {
  const dates = useDates();
  const parts = [
    e.tool || 'Wrench not named',
    e.toolCalibratedOn ? `calibrated ${dates.date(e.toolCalibratedOn)}` : 'calibration date not recorded',
    e.threadlocker ? `threadlocker: ${THREADLOCKER_LABELS[e.threadlocker].toLowerCase()}` : 'threadlocker not recorded',
  ];
  return <Text size="sm">{parts.join(' · ')}</Text>;
}

function TorqueEntryCard({ entry: e }: { entry: TorqueEntryDto }) {
  const dates = useDates();
  return (
    <Card withBorder padding="sm">
      <Group justify="space-between" wrap="nowrap">
        <Text fw={700}>{e.fastener}</Text>
        <Badge color={VERDICT[e.verdict].colour} variant="filled" radius="sm">
          {VERDICT[e.verdict].label}
        </Badge>
      </Group>
      <Text size="sm">
        Maker {e.specified.max ? `${e.specified.min}–${formatTorque(e.specified.max, e.specified.unit)}` : formatTorque(e.specified.min, e.specified.unit)} ·
        applied {formatTorque(e.applied.value, e.applied.unit)}
        {e.carbonPart && ' · carbon part'}
      </Text>
      <ToolLine e={e} />
      <CalibrationNotice overdue={e.calibrationOverdue} />
      <Text size="xs" c="dimmed">
        Source: {e.specSource} · {e.userName ?? 'someone'} · {dates.dateTime(e.at)}
      </Text>
    </Card>
  );
}

/** The torque log with its cautions always in view; the form only for those who may record now. */
export function TorqueEntries({ jobId, canRecord = true }: { jobId: number; canRecord?: boolean }) {
  const entries = useTorqueEntries(jobId);
  return (
    <Stack>
      <Title order={3} size="h4">
        Torque
      </Title>
      <SafetyNote title="Torque" text={TORQUE_CAUTION} />
      <SafetyNote title="Carbon parts" text={CARBON_CAUTION} />
      <QueryState isLoading={entries.isLoading} error={entries.error} />
      {entries.data?.map((e) => (
        <TorqueEntryCard key={e.id} entry={e} />
      ))}
      {canRecord && (
        <Card withBorder padding="md" bg="gray.0">
          <TorqueForm jobId={jobId} />
        </Card>
      )}
    </Stack>
  );
}
