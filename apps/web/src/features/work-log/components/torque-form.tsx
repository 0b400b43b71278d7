import '@mantine/dates/styles.css';
import { TorqueEntryRequestSchema } from '@benchproof/contracts';
import {
  CARBON_CAUTION,
  isWrenchCalibrationOverdue,
  THREADLOCKERS,
  THREADLOCKER_LABELS,
  TORQUE_UNITS,
  TORQUE_UNIT_LABELS,
  type Threadlocker,
  type TorqueUnit,
} from '@benchproof/domain';
import { Alert, Button, Checkbox, NumberInput, SegmentedControl, Select, SimpleGrid, Stack, Switch, Text, TextInput } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useForm } from '@mantine/form';
import dayjs from 'dayjs';
import { SafetyNote } from '../../../components/safety-note';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useAddTorqueEntry } from '../api/work-log';
import { CalibrationNotice } from './calibration-notice';
import { TorqueLive } from './torque-live';

interface Values {
  fastener: string;
  specSource: string;
  isRange: boolean;
  specMin: number | string;
  specMax: number | string;
  specUnit: TorqueUnit;
  applied: number | string;
  appliedUnit: TorqueUnit;
  tool: string;
  toolCalibratedOn: string | null;
  threadlocker: Threadlocker | null;
  carbonPart: boolean;
}

const UNIT_OPTIONS = TORQUE_UNITS.map((u) => ({ value: u, label: TORQUE_UNIT_LABELS[u] }));
const THREADLOCKER_OPTIONS = THREADLOCKERS.map((t) => ({ value: t, label: THREADLOCKER_LABELS[t] }));
const num = (v: number | string) => (v === '' ? null : Number(v));

function toRequest(v: Values) {
  return {
    fastener: v.fastener,
    specSource: v.specSource,
    specified: { min: num(v.specMin) ?? Number.NaN, max: v.isRange ? num(v.specMax) : null, unit: v.specUnit },
    applied: { value: num(v.applied) ?? Number.NaN, unit: v.appliedUnit },
    tool: v.tool,
    toolCalibratedOn: v.toolCalibratedOn ?? undefined,
    threadlocker: v.threadlocker ?? undefined,
    carbonPart: v.carbonPart,
  };
}

/** Request paths → the boxes that hold them. */
const toField = pathTable({
  'specified.min': 'specMin',
  'specified.max': 'specMax',
  'specified.unit': 'specUnit',
  'applied.value': 'applied',
  'applied.unit': 'appliedUnit',
});

const INITIAL: Values = {
  fastener: '',
  specSource: '',
  isRange: false,
  specMin: '',
  specMax: '',
  specUnit: 'nm',
  applied: '',
  appliedUnit: 'nm',
  tool: '',
  toolCalibratedOn: null,
  threadlocker: null,
  carbonPart: false,
};

/** One fastener: the maker's value and where it came from, what was applied, with which wrench. */
export function TorqueForm({ jobId }: { jobId: number }) {
  const add = useAddTorqueEntry(jobId);
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: INITIAL,
    validate: contractResolver(TorqueEntryRequestSchema, toRequest, toField),
  });
  const v = form.getValues();
  const specMin = num(v.specMin);
  const applied = num(v.applied);
  const submit = form.onSubmit((values) =>
    add.mutate(TorqueEntryRequestSchema.parse(toRequest(values)), { onSuccess: () => form.reset(), onError: (e) => showServerFieldErrors(form, e, toField) }),
  );
  const failure = formFailure(add.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        <TextInput label="Fastener" placeholder="e.g. stem steerer clamp bolts" withAsterisk {...form.getInputProps('fastener')} />
        <TextInput
          label="Where the value comes from"
          placeholder="Printed on the stem; maker's manual page…"
          withAsterisk
          {...form.getInputProps('specSource')}
        />
        <Switch label="The maker gives a range" size="md" {...form.getInputProps('isRange', { type: 'checkbox' })} />
        <SimpleGrid cols={{ base: 2, sm: 3 }} spacing="sm">
          <NumberInput
            label={v.isRange ? 'Maker’s minimum' : 'Maker’s value'}
            inputMode="decimal"
            min={0}
            step={0.5}
            decimalScale={2}
            size="lg"
            {...form.getInputProps('specMin')}
          />
          {v.isRange && (
            <NumberInput label="Maker’s maximum" inputMode="decimal" min={0} step={0.5} decimalScale={2} size="lg" {...form.getInputProps('specMax')} />
          )}
          <NumberInput label="Applied" inputMode="decimal" min={0} step={0.5} decimalScale={2} size="lg" {...form.getInputProps('applied')} />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <Stack gap={4}>
            <Text size="sm" fw={500}>
              Unit of the maker’s value
            </Text>
            <SegmentedControl fullWidth size="md" data={UNIT_OPTIONS} {...form.getInputProps('specUnit')} />
          </Stack>
          <Stack gap={4}>
            <Text size="sm" fw={500}>
              Unit on the wrench
            </Text>
            <SegmentedControl fullWidth size="md" data={UNIT_OPTIONS} {...form.getInputProps('appliedUnit')} />
          </Stack>
        </SimpleGrid>
        <TorqueLive
          spec={specMin === null ? null : { min: specMin, max: v.isRange ? num(v.specMax) : null, unit: v.specUnit }}
          applied={applied === null ? null : { value: applied, unit: v.appliedUnit }}
          carbonPart={v.carbonPart}
        />
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <TextInput label="Wrench / tool id" {...form.getInputProps('tool')} />
          <DatePickerInput
            label="Wrench calibrated on"
            placeholder="From the wrench or its certificate"
            clearable
            maxDate={new Date()}
            size="md"
            valueFormat="D MMM YYYY"
            {...form.getInputProps('toolCalibratedOn')}
          />
        </SimpleGrid>
        <CalibrationNotice overdue={isWrenchCalibrationOverdue(v.toolCalibratedOn, dayjs().format('YYYY-MM-DD'))} />
        <Select label="Threadlocker" placeholder="Not recorded" data={THREADLOCKER_OPTIONS} clearable size="md" {...form.getInputProps('threadlocker')} />
        <Checkbox label="Carbon part" size="md" {...form.getInputProps('carbonPart', { type: 'checkbox' })} />
        {v.carbonPart && <SafetyNote title="Carbon" text={CARBON_CAUTION} />}
        {failure && <Alert color="red">{failure}</Alert>}
        <Button type="submit" size="lg" loading={add.isPending}>
          Log torque
        </Button>
      </Stack>
    </form>
  );
}
