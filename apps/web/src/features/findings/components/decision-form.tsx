import '@mantine/dates/styles.css';
import { RecordDecisionRequestSchema, type RecordDecisionRequest } from '@benchproof/contracts';
import { Alert, Button, SegmentedControl, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { DateTimePicker } from '@mantine/dates';
import { useForm } from '@mantine/form';
import dayjs from 'dayjs';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useRecordDecision } from '../api/findings';
import { useDates } from '../../../lib/dates';

interface Values {
  status: RecordDecisionRequest['status'];
  channel: RecordDecisionRequest['channel'];
  decidedByName: string;
  decidedAt: string | null;
  note: string;
}

const toRequest = (v: Values) => ({ ...v, decidedAt: v.decidedAt ? dayjs(v.decidedAt).toISOString() : undefined });

const STATUS_OPTIONS = [
  { value: 'approved', label: 'Approved' },
  { value: 'declined', label: 'Declined' },
  { value: 'pending', label: 'Undecided' },
];
const CHANNEL_OPTIONS = [
  { value: 'phone', label: 'Phone' },
  { value: 'in_person', label: 'In person' },
  { value: 'email', label: 'E-mail' },
];

interface Props {
  jobId: number;
  recommendationId: number;
  ownerName: string;
  recorderName: string;
  onDone: () => void;
}

/** The decision form's values and its submit: validated with the request's contract, server field errors under the fields. */
function useDecisionForm({ jobId, recommendationId, ownerName, onDone }: Omit<Props, 'recorderName'>) {
  const record = useRecordDecision(jobId, recommendationId);
  const form = useForm<Values>({
    initialValues: { status: 'approved', channel: 'phone', decidedByName: ownerName, decidedAt: dayjs().format('YYYY-MM-DD HH:mm:ss'), note: '' },
    validate: contractResolver(RecordDecisionRequestSchema, toRequest),
  });
  const submit = form.onSubmit((v) =>
    record.mutate(RecordDecisionRequestSchema.parse(toRequest(v)), { onSuccess: onDone, onError: (e) => showServerFieldErrors(form, e) }),
  );
  return { form, submit, pending: record.isPending, failure: formFailure(record.error) };
}

/** Desk records the owner's answer taken by phone, in person or by e-mail; the signed-in user is the recorder. */
export function DecisionForm({ recorderName, ...props }: Props) {
  const dates = useDates();
  const { form, submit, pending, failure } = useDecisionForm(props);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <SegmentedControl fullWidth size="lg" data={STATUS_OPTIONS} {...form.getInputProps('status')} />
        <SegmentedControl fullWidth size="md" data={CHANNEL_OPTIONS} {...form.getInputProps('channel')} />
        <TextInput label="Who decided" description="The owner, or the person they named" {...form.getInputProps('decidedByName')} />
        <DateTimePicker
          label="When"
          valueFormat={dates.pickerTimeFormat}
          firstDayOfWeek={dates.firstDayOfWeek}
          maxDate={new Date()}
          size="md"
          {...form.getInputProps('decidedAt')}
        />
        <Textarea label="Note" autosize minRows={2} {...form.getInputProps('note')} />
        <Text size="sm" c="dimmed">
          Recorded by {recorderName}.
        </Text>
        <Button type="submit" size="lg" loading={pending}>
          Record decision
        </Button>
      </Stack>
    </form>
  );
}
