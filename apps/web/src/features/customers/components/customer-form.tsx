import { CustomerInputSchema, type CustomerDto } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { ApiError } from '../../../lib/api-client';
import { useSaveCustomer } from '../api/customers';
import { CustomerFields } from './customer-fields';

export interface CustomerFormValues {
  name: string;
  email: string;
  phone: string;
  preferredChannel: CustomerDto['preferredChannel'];
  notes: string;
}

export const EMPTY_CUSTOMER: CustomerFormValues = { name: '', email: '', phone: '', preferredChannel: 'phone', notes: '' };

/** Create or edit a customer; validated with the API's schema, server field errors land on the fields. */
export function CustomerForm({ customer, onDone }: { customer?: CustomerDto; onDone: (c: CustomerDto) => void }) {
  const save = useSaveCustomer(customer?.id);
  const form = useForm<CustomerFormValues>({
    initialValues: customer
      ? { name: customer.name, email: customer.email ?? '', phone: customer.phone ?? '', preferredChannel: customer.preferredChannel, notes: customer.notes ?? '' }
      : EMPTY_CUSTOMER,
    validate: schemaResolver(CustomerInputSchema, { sync: true }),
  });
  const submit = form.onSubmit((values) =>
    save.mutate(CustomerInputSchema.parse(values), {
      onSuccess: onDone,
      onError: (e) => e instanceof ApiError && form.setErrors(e.fieldErrors()),
    }),
  );
  const failure = save.error instanceof ApiError && save.error.code !== 'VALIDATION_FAILED' ? save.error.message : null;
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <CustomerFields field={(name) => form.getInputProps(name)} />
        <Button type="submit" size="lg" loading={save.isPending}>{customer ? 'Save changes' : 'Add customer'}</Button>
      </Stack>
    </form>
  );
}
