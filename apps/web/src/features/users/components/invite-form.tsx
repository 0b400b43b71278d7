import { InviteRequestSchema, ROLE_LABELS, ROLES, type InviteRequest } from '@benchproof/contracts';
import { Alert, Button, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconSend } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { useInvite } from '../api/users';

/** A manager invites by e-mail; the person chooses their own password from the link. */
export function InviteForm({ onDone }: { onDone: () => void }) {
  const invite = useInvite();
  const form = useForm<InviteRequest>({
    initialValues: { name: '', email: '', role: 'mechanic' },
    validate: contractResolver(InviteRequestSchema, (v: InviteRequest) => v),
  });
  const submit = form.onSubmit((values) =>
    invite.mutate(InviteRequestSchema.parse(values), {
      onSuccess: onDone,
      onError: (e) => {
        if (e instanceof ApiError && (e.code === 'EMAIL_TAKEN' || e.code === 'CONFLICT')) form.setFieldError('email', e.message);
        else showServerFieldErrors(form, e);
      },
    }),
  );
  const failure = invite.error instanceof ApiError && ['EMAIL_TAKEN', 'CONFLICT'].includes(invite.error.code) ? null : formFailure(invite.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && <Alert color="red">{failure}</Alert>}
        <TextInput label="Full name" size="lg" {...form.getInputProps('name')} />
        <TextInput label="E-mail" type="email" inputMode="email" size="lg" {...form.getInputProps('email')} />
        <SegmentedControl fullWidth size="md" data={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} {...form.getInputProps('role')} />
        <Text size="sm" c="dimmed">
          They get an e-mail with a link to choose their own password. It works once, for 7 days.
        </Text>
        <Button type="submit" size="lg" leftSection={<IconSend />} loading={invite.isPending}>
          Send invitation
        </Button>
      </Stack>
    </form>
  );
}
