import { BikeInputSchema, type BikeDto } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { ApiError } from '../../../lib/api-client';
import { useSaveBike } from '../api/bikes';
import { BikeSpecFields } from './bike-spec-fields';
import { bikeFormToInput, bikeToForm, EMPTY_BIKE, type BikeFormValues } from './spec-labels';

/** Add a bike to a customer, or edit its specs; the API's schema validates both here and there. */
export function BikeForm({ customerId, bike, onDone }: { customerId: number; bike?: BikeDto; onDone: (b: BikeDto) => void }) {
  const save = useSaveBike(bike?.id);
  const form = useForm<BikeFormValues>({
    initialValues: bike ? bikeToForm(bike) : EMPTY_BIKE,
    validate: (v) => {
      const r = BikeInputSchema.safeParse({ ...bikeFormToInput(v), customerId });
      return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join('.'), i.message]));
    },
  });
  const submit = form.onSubmit((v) =>
    save.mutate(BikeInputSchema.parse({ ...bikeFormToInput(v), customerId }), { onSuccess: onDone, onError: (e) => e instanceof ApiError && form.setErrors(e.fieldErrors()) }),
  );
  const failure = save.error instanceof ApiError && save.error.code !== 'VALIDATION_FAILED' ? save.error.message : null;
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <BikeSpecFields field={(name) => form.getInputProps(name)} />
        <Button type="submit" size="lg" loading={save.isPending}>{bike ? 'Save bike' : 'Add bike'}</Button>
      </Stack>
    </form>
  );
}
