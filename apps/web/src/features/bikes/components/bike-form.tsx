import { BikeInputSchema, type BikeDto } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-client';
import { useSaveBike } from '../api/bikes';
import { BikeSpecFields } from './bike-spec-fields';
import { bikeFormToInput, bikeToForm, EMPTY_BIKE, type BikeFormValues } from './spec-labels';

/** Add a bike to a customer, or edit its specs; the API's schema validates both here and there. */
export function BikeForm({ customerId, bike, onDone }: { customerId: number; bike?: BikeDto; onDone: (b: BikeDto) => void }) {
  const save = useSaveBike(bike?.id);
  const form = useForm<BikeFormValues>({
    initialValues: bike ? bikeToForm(bike) : EMPTY_BIKE,
    // The web's one validation pattern: the contract's schema through Mantine's resolver (here after the form→input step).
    validate: schemaResolver(
      z.preprocess((v) => ({ ...bikeFormToInput(v as BikeFormValues), customerId }), BikeInputSchema),
      { sync: true },
    ),
  });
  const submit = form.onSubmit((v) =>
    save.mutate(BikeInputSchema.parse({ ...bikeFormToInput(v), customerId }), {
      onSuccess: onDone,
      onError: (e) => e instanceof ApiError && form.setErrors(e.fieldErrors()),
    }),
  );
  const failure = save.error instanceof ApiError && save.error.code !== 'VALIDATION_FAILED' ? save.error.message : null;
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
