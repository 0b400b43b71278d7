import { CreateFindingRequestSchema, type CreateFindingRequest, type FindingDto } from '@benchproof/contracts';
import { INSPECTION_AREAS, INSPECTION_AREA_LABELS } from '@benchproof/domain';
import { Alert, Button, Select, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { ConditionPicker } from '../../../components/condition-picker';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useSaveFinding } from '../api/findings';

const AREA_OPTIONS = INSPECTION_AREAS.map((a) => ({ value: a, label: INSPECTION_AREA_LABELS[a] }));

/** Add or edit a finding: area, condition on our scale, and what is wrong in plain words. */
export function FindingForm({ jobId, finding, onDone }: { jobId: number; finding?: FindingDto; onDone: () => void }) {
  const save = useSaveFinding(jobId, finding?.id);
  const form = useForm<CreateFindingRequest>({
    initialValues: {
      area: finding?.area ?? 'drivetrain',
      condition: finding?.condition ?? 'worn',
      description: finding?.description ?? '',
      checkpointId: finding?.checkpointId ?? null,
    },
    validate: contractResolver(CreateFindingRequestSchema, (v: CreateFindingRequest) => v),
  });
  const submit = form.onSubmit((v) => save.mutate(CreateFindingRequestSchema.parse(v), { onSuccess: onDone, onError: (e) => showServerFieldErrors(form, e) }));
  const failure = formFailure(save.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <Select label="Area" data={AREA_OPTIONS} allowDeselect={false} {...form.getInputProps('area')} />
        <Stack gap={4}>
          <Text size="sm" fw={500}>
            Condition
          </Text>
          <ConditionPicker label="Condition" value={form.getValues().condition} onChange={(c) => form.setFieldValue('condition', c)} />
        </Stack>
        <Textarea
          label="What is wrong"
          description="In words the owner will understand"
          autosize
          minRows={3}
          withAsterisk
          {...form.getInputProps('description')}
        />
        <Button type="submit" size="lg" loading={save.isPending}>
          {finding ? 'Save finding' : 'Add finding'}
        </Button>
      </Stack>
    </form>
  );
}
