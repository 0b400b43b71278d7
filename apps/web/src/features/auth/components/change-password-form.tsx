import { ChangePasswordRequestSchema, MIN_PASSWORD_LENGTH, type ChangePasswordRequest } from '@benchproof/contracts';
import { Alert, Button, PasswordInput, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertTriangle, IconCircleCheck, IconKey } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useChangePassword } from '../api/session';

const EMPTY: ChangePasswordRequest = { currentPassword: '', newPassword: '' };

/** The signed-in user changes their own password; the API signs every other device out. */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const form = useForm<ChangePasswordRequest>({
    initialValues: EMPTY,
    validate: contractResolver(ChangePasswordRequestSchema, (v: ChangePasswordRequest) => v),
  });
  const onError = (e: unknown) => {
    // A wrong current password is a field problem, not a lost session: it goes under that box.
    if (e instanceof ApiError && e.code === 'INVALID_CREDENTIALS') form.setFieldError('currentPassword', e.message);
    else showServerFieldErrors(form, e);
  };
  const submit = form.onSubmit((v) => change.mutate(ChangePasswordRequestSchema.parse(v), { onSuccess: () => form.reset(), onError }));
  const failure = change.error instanceof ApiError && change.error.code === 'INVALID_CREDENTIALS' ? null : formFailure(change.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={480}>
        {change.isSuccess && (
          <Alert color="teal" variant="light" icon={<IconCircleCheck />} role="status" title="Password changed">
            Every other device signed in as you has been signed out. This one stays signed in.
          </Alert>
        )}
        {failure && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {failure}
          </Alert>
        )}
        <PasswordInput label="Current password" autoComplete="current-password" size="lg" {...form.getInputProps('currentPassword')} />
        <PasswordInput
          label="New password"
          description={`${MIN_PASSWORD_LENGTH} characters or more; a short sentence is easy to remember`}
          autoComplete="new-password"
          size="lg"
          {...form.getInputProps('newPassword')}
        />
        <Button type="submit" size="lg" leftSection={<IconKey />} loading={change.isPending}>
          Change password
        </Button>
      </Stack>
    </form>
  );
}
