import { CustomerInputSchema, type CustomerDto } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useSaveCustomer } from '../api/customers';
import { CustomerFields } from './customer-fields';
import { customerFormToInput, customerToForm, EMPTY_CUSTOMER, type CustomerFormValues } from './customer-model';

/** Create or edit a customer; validated with the API's schema, server field errors land on the fields. */
export function CustomerForm({ customer, onDone }: { customer?: CustomerDto; onDone: (c: CustomerDto) => void }) {
  const save = useSaveCustomer(customer?.id);
  const form = useForm<CustomerFormValues>({
    initialValues: customer ? customerToForm(customer) : EMPTY_CUSTOMER,
    validate: contractResolver(CustomerInputSchema, customerFormToInput),
  });
  const submit = form.onSubmit((values) =>
    save.mutate(CustomerInputSchema.parse(customerFormToInput(values)), { onSuccess: onDone, onError: (e) => showServerFieldErrors(form, e) }),
  );
  const failure = formFailure(save.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <CustomerFields field={(name) => form.getInputProps(name)} />
        <Button type="submit" size="lg" loading={save.isPending}>
          {customer ? 'Save changes' : 'Add customer'}
        </Button>
      </Stack>
    </form>
  );
}
