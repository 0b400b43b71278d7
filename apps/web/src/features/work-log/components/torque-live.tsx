import { convertTorque, formatTorque, isDomainInputError, torqueVerdict, TORQUE_UNITS, type TorqueSpec, type TorqueUnit } from '@benchproof/domain';
import { Alert, Badge, Group, Paper, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';

const VERDICT_TEXT = { within: 'Within specification', under: 'Under the maker’s value', over: 'Over the maker’s value' } as const;

interface Applied {
  value: number;
  unit: TorqueUnit;
}
interface Props {
  spec: TorqueSpec | null;
  applied: Applied | null;
  carbonPart: boolean;
}

/** The applied torque in every other unit, for reference only. */
function OtherUnits({ applied }: { applied: Applied }) {
  return (
    <Group gap={6}>
      <Text size="xs" c="dimmed">
        For reference only:
      </Text>
      {TORQUE_UNITS.filter((u) => u !== applied.unit).map((u) => (
        <Badge key={u} variant="outline" color="gray" radius="sm" tt="none">
          {formatTorque(convertTorque(applied.value, applied.unit, u), u)}
        </Badge>
      ))}
    </Group>
  );
}

/** The verdict as the mechanic types (libs/domain torqueVerdict), plus the reading in every unit for reference. */
export function TorqueLive({ spec, applied, carbonPart }: Props) {
  if (!spec || !applied)
    return (
      <Text size="sm" c="dimmed">
        Enter the maker’s value and the applied torque to see the verdict.
      </Text>
    );
  let v;
  try {
    v = torqueVerdict({ specified: spec, applied, carbonPart });
  } catch (e) {
    if (isDomainInputError(e))
      return (
        <Alert color="red" variant="light">
          {e.message}
        </Alert>
      );
    throw e;
  }
  const ok = v.verdict === 'within';
  return (
    <Paper withBorder p="sm" role="status" aria-live="polite">
      <Stack gap={6}>
        <Group gap="xs">
          {ok ? <IconCircleCheck color="var(--mantine-color-teal-8)" /> : <IconAlertTriangle color="var(--mantine-color-red-8)" />}
          <Text fw={800} c={ok ? 'teal.9' : 'red.8'}>
            {VERDICT_TEXT[v.verdict]}
          </Text>
        </Group>
        <Text size="sm">{v.message}</Text>
        <OtherUnits applied={applied} />
      </Stack>
    </Paper>
  );
}
