import { CreateUserRequestSchema, ROLE_LABELS, ROLES, type CreateUserRequest } from '@benchproof/contracts';
import { Alert, Button, PasswordInput, SegmentedControl, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { ApiError } from '../../../lib/api-client';
import { useCreateUser } from '../api/users';

/** Validates with the same zod schema the API uses; server field errors land on the fields. */
export function AddUserForm({ onDone }: { onDone: () => void }) {
  const create = useCreateUser();
  const form = useForm<CreateUserRequest>({
    initialValues: { name: '', email: '', role: 'mechanic', password: '' },
    validate: schemaResolver(CreateUserRequestSchema, { sync: true }),
  });
  const submit = form.onSubmit((values) =>
    create.mutate(values, {
      onSuccess: onDone,
      onError: (e) => {
        if (e instanceof ApiError && e.code === 'EMAIL_TAKEN') form.setFieldError('email', e.message);
        else if (e instanceof ApiError) form.setErrors(e.fieldErrors());
      },
    }),
  );
  const failure = create.error instanceof ApiError && !['EMAIL_TAKEN', 'VALIDATION_FAILED'].includes(create.error.code) ? create.error.message : null;

  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <TextInput label="Full name" {...form.getInputProps('name')} />
        <TextInput label="E-mail" type="email" {...form.getInputProps('email')} />
        <SegmentedControl fullWidth size="md" data={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} {...form.getInputProps('role')} />
        <PasswordInput label="First password" description="At least 10 characters; they can change it later." {...form.getInputProps('password')} />
        <Button type="submit" loading={create.isPending}>
          Add user
        </Button>
      </Stack>
    </form>
  );
}
