import { Stack } from '@mantine/core';
import { ChangePasswordForm, RequireTwoFactorCard, TwoFactorCard, useCan } from '../../../features/auth';
import { PageHeader } from '../../../components/page-header';

/** Open to every signed-in role: each person looks after their own password and second factor. */
export function PasswordRoute() {
  const can = useCan();
  return (
    <Stack gap="xl">
      <div>
        <PageHeader title="Sign-in & security" subtitle="Changing your password signs you out on every other phone, tablet and computer." />
        <ChangePasswordForm />
      </div>
      <TwoFactorCard />
      {can('shop.edit') && <RequireTwoFactorCard />}
    </Stack>
  );
}
