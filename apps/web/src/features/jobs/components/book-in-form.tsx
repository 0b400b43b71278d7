import '@mantine/dates/styles.css';
import type { JobDetail } from '@benchproof/contracts';
import { Alert, Button, Paper, SegmentedControl, Select, SimpleGrid, Stack, Text, Textarea, Title } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { IconAlertTriangle, IconCheck } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useBookIn } from '../api/jobs';
import { initialBookIn, parseBookIn, validateBookIn, type BikeFormModel, type BookInValues, type CustomerFormModel } from './book-in-values';
import type { Option } from './job-filters';
import { useDates } from '../../../lib/dates';

type FieldProps = ReturnType<UseFormReturnType<BookInValues>['getInputProps']>;
export type FieldGetter = (name: string) => FieldProps;
export interface PickedCustomer {
  id: number;
  label: string;
}

/** Feature pieces the route plugs in (customers and bikes live in their own features). */
export interface BookInSlots {
  customerSearch: (p: { selected: PickedCustomer | null; onPick: (c: PickedCustomer | null) => void; error?: ReactNode }) => ReactNode;
  customerFields: (field: FieldGetter) => ReactNode;
  bikeChooser: (p: { customerId: number; selectedId: number | null; onPick: (id: number | null) => void; error?: ReactNode }) => ReactNode;
  bikeFields: (field: FieldGetter) => ReactNode;
  bikeModel: BikeFormModel;
  customerModel: CustomerFormModel;
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper withBorder p="md" radius="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          {title}
        </Title>
        {children}
      </Stack>
    </Paper>
  );
}

function CustomerSection({ form, slots }: { form: UseFormReturnType<BookInValues>; slots: BookInSlots }) {
  const v = form.getValues();
  const picked = v.customerId ? { id: v.customerId, label: v.customerLabel } : null;
  return (
    <Section title="1 · Owner">
      <SegmentedControl
        fullWidth
        size="md"
        data={[
          { value: 'existing', label: 'Find a customer' },
          { value: 'new', label: 'New customer' },
        ]}
        {...form.getInputProps('customerMode')}
      />
      {v.customerMode === 'existing'
        ? slots.customerSearch({
            selected: picked,
            error: form.errors.customerId,
            onPick: (c) => form.setValues({ customerId: c?.id ?? null, customerLabel: c?.label ?? '', bikeId: null }),
          })
        : slots.customerFields((name) => form.getInputProps(`newCustomer.${name}`))}
    </Section>
  );
}

function BikeSection({ form, slots }: { form: UseFormReturnType<BookInValues>; slots: BookInSlots }) {
  const v = form.getValues();
  const canPick = v.customerMode === 'existing';
  return (
    <Section title="2 · Bike">
      {canPick && (
        <SegmentedControl
          fullWidth
          size="md"
          data={[
            { value: 'existing', label: 'One of their bikes' },
            { value: 'new', label: 'New bike' },
          ]}
          {...form.getInputProps('bikeMode')}
        />
      )}
      {canPick && v.bikeMode === 'existing' ? (
        v.customerId ? (
          slots.bikeChooser({ customerId: v.customerId, selectedId: v.bikeId, error: form.errors.bikeId, onPick: (id) => form.setFieldValue('bikeId', id) })
        ) : (
          <Text c="dimmed">Pick the customer first.</Text>
        )
      ) : (
        slots.bikeFields((name) => form.getInputProps(`newBike.${name}`))
      )}
    </Section>
  );
}

/** What the owner reports, the day the bike is promised for and who works on it. */
function SymptomsSection({ form, mechanics }: { form: UseFormReturnType<BookInValues>; mechanics: Option[] }) {
  const dates = useDates();
  return (
    <Section title="3 · What the owner tells us">
      <Textarea
        label="Reported symptoms, in the owner's words"
        withAsterisk
        description="Noises, poor shifting, anything that feels wrong — write it as they say it."
        autosize
        minRows={5}
        maxRows={14}
        {...form.getInputProps('reportedSymptoms')}
      />
      <SimpleGrid cols={{ base: 1, sm: 2 }}>
        <DatePickerInput
          label="Promised for"
          withAsterisk
          placeholder="Pick a day"
          clearable
          size="md"
          minDate={new Date()}
          valueFormat={dates.pickerFormat}
          firstDayOfWeek={dates.firstDayOfWeek}
          {...form.getInputProps('promisedOn')}
        />
        <Select label="Mechanic" placeholder="Assign later" data={mechanics} clearable {...form.getInputProps('mechanicId')} />
      </SimpleGrid>
    </Section>
  );
}

/** A refusal about the owner's phone (PHONE_INVALID) lands under the new owner's phone box. */
const NEW_OWNER_BOXES = pathTable({ phone: 'newCustomer.phone' });

/** Booking-in: owner, bike, symptoms, promised day and mechanic in one submit. */
export function BookInForm({ slots, mechanics, onBooked }: { slots: BookInSlots; mechanics: Option[]; onBooked: (job: JobDetail) => void }) {
  const bookIn = useBookIn();
  const models = { customer: slots.customerModel, bike: slots.bikeModel };
  const form = useForm<BookInValues>({ mode: 'controlled', initialValues: initialBookIn(models), validate: validateBookIn(models) });
  const submit = form.onSubmit((values) =>
    bookIn.mutate(parseBookIn(values, models), { onSuccess: onBooked, onError: (e) => showServerFieldErrors(form, e, NEW_OWNER_BOXES) }),
  );
  const failure = formFailure(bookIn.error);
  const hasErrors = Object.keys(form.errors).length > 0;
  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={860}>
        <CustomerSection form={form} slots={slots} />
        <BikeSection form={form} slots={slots} />
        <SymptomsSection form={form} mechanics={mechanics} />
        {hasErrors && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            Some fields need attention — they are marked below their boxes. Nothing you typed is lost.
          </Alert>
        )}
        {failure && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {failure}
          </Alert>
        )}
        <Button type="submit" size="lg" leftSection={<IconCheck />} loading={bookIn.isPending}>
          Book in
        </Button>
      </Stack>
    </form>
  );
}
