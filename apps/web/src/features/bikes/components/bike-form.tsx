import { BikeInputSchema, type BikeDto } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useSaveBike } from '../api/bikes';
import { BikeSpecFields } from './bike-spec-fields';
import { bikeFormToInput, bikeToForm, EMPTY_BIKE, type BikeFormValues } from './spec-labels';

/** Add a bike to a customer, or edit its specs; the API's schema validates both here and there. */
export function BikeForm({ customerId, bike, onDone }: { customerId: number; bike?: BikeDto; onDone: (b: BikeDto) => void }) {
  const save = useSaveBike(bike?.id);
  const toInput = (v: BikeFormValues) => ({ ...bikeFormToInput(v), customerId });
  const form = useForm<BikeFormValues>({
    initialValues: bike ? bikeToForm(bike) : EMPTY_BIKE,
    validate: contractResolver(BikeInputSchema, toInput),
  });
  const submit = form.onSubmit((v) => save.mutate(BikeInputSchema.parse(toInput(v)), { onSuccess: onDone, onError: (e) => showServerFieldErrors(form, e) }));
  const failure = formFailure(save.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <BikeSpecFields field={(name) => form.getInputProps(name)} />
        <Button type="submit" size="lg" loading={save.isPending}>
          {bike ? 'Save bike' : 'Add bike'}
        </Button>
      </Stack>
    </form>
  );
}
