import { WorkEntryRequestSchema, type WorkEntryRequest } from '@benchproof/contracts';
import { Alert, Button, Card, Checkbox, Group, NumberInput, Stack, Text, Textarea, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { QueryState } from '../../../components/query-state';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useAddWorkEntry, useWorkEntries } from '../api/work-log';
import { useDates } from '../../../lib/dates';

function WorkEntryForm({ jobId }: { jobId: number }) {
  const add = useAddWorkEntry(jobId);
  const form = useForm<WorkEntryRequest>({
    initialValues: { description: '', partsUsed: '', minutes: 15, chargeable: false },
    validate: contractResolver(WorkEntryRequestSchema, (v: WorkEntryRequest) => v),
  });
  const submit = form.onSubmit((v) => add.mutate(v, { onSuccess: () => form.reset(), onError: (e) => showServerFieldErrors(form, e) }));
  const failure = formFailure(add.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        <Textarea label="What was done" autosize minRows={2} withAsterisk {...form.getInputProps('description')} />
        <Textarea label="Parts used" autosize minRows={1} {...form.getInputProps('partsUsed')} />
        <NumberInput label="Minutes" inputMode="numeric" min={0} max={1440} step={5} allowDecimal={false} size="lg" {...form.getInputProps('minutes')} />
        <Checkbox size="md" label="Charge this time to the owner (shop labour rate)" {...form.getInputProps('chargeable', { type: 'checkbox' })} />
        {failure && <Alert color="red">{failure}</Alert>}
        <Button type="submit" size="lg" loading={add.isPending}>
          Log work
        </Button>
      </Stack>
    </form>
  );
}

/** What was done on the bench, with parts and time; the form only for those who may record now. */
export function WorkEntries({ jobId, canRecord = true }: { jobId: number; canRecord?: boolean }) {
  const dates = useDates();
  const entries = useWorkEntries(jobId);
  const total = entries.data?.reduce((s, e) => s + e.minutes, 0) ?? 0;
  return (
    <Stack>
      <Group justify="space-between">
        <Title order={3} size="h4">
          Work done
        </Title>
        <Text c="dimmed">{total} min logged</Text>
      </Group>
      <QueryState isLoading={entries.isLoading} error={entries.error} />
      {entries.data?.map((e) => (
        <Card key={e.id} withBorder padding="sm">
          <Text style={{ whiteSpace: 'pre-wrap' }}>{e.description}</Text>
          {e.partsUsed && <Text size="sm">Parts: {e.partsUsed}</Text>}
          <Text size="xs" c="dimmed">
            {e.minutes} min{e.rateMinor !== null ? ' · charged' : ''} · {e.userName ?? 'someone'} · {dates.dateTime(e.at)}
          </Text>
        </Card>
      ))}
      {canRecord && (
        <Card withBorder padding="md" bg="gray.0">
          <WorkEntryForm jobId={jobId} />
        </Card>
      )}
    </Stack>
  );
}
