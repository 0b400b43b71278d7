import type { CheckpointDto } from '@benchproof/contracts';
import { type ChainLimitPolicy, type LengthUnit } from '@benchproof/domain';
import { Alert, Badge, Card, Collapse, Group, Stack, Text, Textarea, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconChevronDown, IconRuler2 } from '@tabler/icons-react';
import { useState } from 'react';
import { ConditionBadge } from '../../../components/condition-badge';
import { ConditionPicker } from '../../../components/condition-picker';
import { formFailure } from '../../../lib/form';
import { useAddMeasurement, useUpdateCheckpoint } from '../api/inspection';
import { MeasurementForm } from './measurement-form';
import { useDates } from '../../../lib/dates';

interface Props {
  jobId: number;
  checkpoint: CheckpointDto;
  speeds: number;
  chainPolicy?: Partial<ChainLimitPolicy>;
  lengthUnit: LengthUnit;
  /** False for a role that may not record, or a handed-over job it may not correct: read only. */
  canRecord?: boolean;
}

function SavedReadings({ checkpoint }: { checkpoint: CheckpointDto }) {
  const dates = useDates();
  if (checkpoint.measurements.length === 0) return null;
  return (
    <Stack gap={4}>
      {checkpoint.measurements.map((m) => (
        <Group key={m.id} gap="xs" wrap="nowrap" align="flex-start">
          <ConditionBadge condition={m.result.condition} size="sm" />
          <Text size="sm">
            {m.result.message}{' '}
            <Text span c="dimmed" size="xs">
              ({dates.dateTime(m.at)})
            </Text>
          </Text>
        </Group>
      ))}
    </Stack>
  );
}

function Readings(props: Props) {
  const { jobId, checkpoint, speeds, chainPolicy, lengthUnit } = props;
  const add = useAddMeasurement(jobId, checkpoint.id);
  const [opened, { toggle }] = useDisclosure(checkpoint.measurements.length === 0);
  const [round, setRound] = useState(0);
  if (checkpoint.measurementKinds.length === 0) return null;
  if (props.canRecord === false) return <SavedReadings checkpoint={checkpoint} />;
  return (
    <Stack gap="xs">
      <SavedReadings checkpoint={checkpoint} />
      <UnstyledButton onClick={toggle} mih={44} aria-expanded={opened}>
        <Group gap={6}>
          <IconRuler2 size={20} />
          <Text fw={600}>{checkpoint.measurements.length ? 'Take another reading' : 'Enter the reading'}</Text>
          <IconChevronDown size={18} />
        </Group>
      </UnstyledButton>
      <Collapse expanded={opened}>
        <Stack>
          {checkpoint.measurementKinds.map((kind) => (
            <MeasurementForm
              key={`${kind}-${round}`}
              kind={kind}
              ctx={{ checkpointKey: checkpoint.key, lengthUnit }}
              speeds={speeds}
              chainPolicy={chainPolicy}
              saving={add.isPending}
              onSave={(input) => add.mutate(input, { onSuccess: () => setRound((r) => r + 1) })}
            />
          ))}
          {add.error && (
            <Alert color="red" role="alert">
              {formFailure(add.error)}
            </Alert>
          )}
        </Stack>
      </Collapse>
    </Stack>
  );
}

/** One checkpoint: condition by one tap, notes, and its typed readings with the live verdict. */
export function CheckpointCard(props: Props) {
  const { jobId, checkpoint, canRecord = true } = props;
  const update = useUpdateCheckpoint(jobId, checkpoint.id);
  const [notes, setNotes] = useState(checkpoint.notes);
  return (
    <Card withBorder padding="md">
      <Stack gap="sm">
        <Group justify="space-between" wrap="nowrap" align="flex-start">
          <Text fw={700}>{checkpoint.label}</Text>
          {checkpoint.safetyCritical && (
            <Badge color="brass" variant="light" radius="sm" style={{ flexShrink: 0 }}>
              Safety
            </Badge>
          )}
        </Group>
        <ConditionPicker
          label={`Condition of ${checkpoint.label}`}
          value={checkpoint.condition}
          disabled={update.isPending || !canRecord}
          onChange={(condition) => update.mutate({ condition })}
        />
        <Readings {...props} />
        <Textarea
          aria-label={`Notes on ${checkpoint.label}`}
          placeholder="Notes"
          readOnly={!canRecord}
          autosize
          minRows={1}
          value={notes}
          onChange={(e) => setNotes(e.currentTarget.value)}
          onBlur={() => notes !== checkpoint.notes && update.mutate({ notes })}
        />
        {update.error && (
          <Alert color="red" role="alert">
            {formFailure(update.error)}
          </Alert>
        )}
      </Stack>
    </Card>
  );
}
