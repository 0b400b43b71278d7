import '@mantine/dates/styles.css';
import { CARBON_CAUTION, isWrenchCalibrationOverdue, THREADLOCKERS, THREADLOCKER_LABELS, TORQUE_UNITS, TORQUE_UNIT_LABELS } from '@benchproof/domain';
import { Alert, Button, Checkbox, NumberInput, SegmentedControl, Select, SimpleGrid, Stack, Switch, Text, TextInput } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import dayjs from 'dayjs';
import { SafetyNote } from '../../../components/safety-note';
import { CalibrationNotice } from './calibration-notice';
import { TorqueLive } from './torque-live';
import { num, useTorqueForm, type TorqueFormState } from './use-torque-form';
import { useDates } from '../../../lib/dates';

const UNIT_OPTIONS = TORQUE_UNITS.map((u) => ({ value: u, label: TORQUE_UNIT_LABELS[u] }));
const THREADLOCKER_OPTIONS = THREADLOCKERS.map((t) => ({ value: t, label: THREADLOCKER_LABELS[t] }));

/** The maker's value (or range) and the applied torque, each with its own unit: the wrench may read in another unit than the manual. */
function TorqueValueFields({ form }: { form: TorqueFormState }) {
  const v = form.getValues();
  return (
    <>
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
    </>
  );
}

/** Which wrench, when it was last calibrated, and a notice when that is too long ago. */
function WrenchFields({ form }: { form: TorqueFormState }) {
  const dates = useDates();
  return (
    <>
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
        <TextInput label="Wrench / tool id" {...form.getInputProps('tool')} />
        <DatePickerInput
          label="Wrench calibrated on"
          placeholder="From the wrench or its certificate"
          clearable
          maxDate={new Date()}
          size="md"
          valueFormat={dates.pickerFormat}
          firstDayOfWeek={dates.firstDayOfWeek}
          {...form.getInputProps('toolCalibratedOn')}
        />
      </SimpleGrid>
      <CalibrationNotice overdue={isWrenchCalibrationOverdue(form.getValues().toolCalibratedOn, dayjs().format('YYYY-MM-DD'))} />
    </>
  );
}

/** One fastener: the maker's value and where it came from, what was applied, with which wrench. */
export function TorqueForm({ jobId }: { jobId: number }) {
  const { form, submit, pending, failure } = useTorqueForm(jobId);
  const v = form.getValues();
  const specMin = num(v.specMin);
  const applied = num(v.applied);
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
        <TorqueValueFields form={form} />
        <TorqueLive
          spec={specMin === null ? null : { min: specMin, max: v.isRange ? num(v.specMax) : null, unit: v.specUnit }}
          applied={applied === null ? null : { value: applied, unit: v.appliedUnit }}
          carbonPart={v.carbonPart}
        />
        <WrenchFields form={form} />
        <Select label="Threadlocker" placeholder="Not recorded" data={THREADLOCKER_OPTIONS} clearable size="md" {...form.getInputProps('threadlocker')} />
        <Checkbox label="Carbon part" size="md" {...form.getInputProps('carbonPart', { type: 'checkbox' })} />
        {v.carbonPart && <SafetyNote title="Carbon" text={CARBON_CAUTION} />}
        {failure && <Alert color="red">{failure}</Alert>}
        <Button type="submit" size="lg" loading={pending}>
          Log torque
        </Button>
      </Stack>
    </form>
  );
}
