import { ChangePasswordForm } from '../../../features/auth';
import { PageHeader } from '../../../components/page-header';

/** Open to every signed-in role: each person looks after their own password. */
export function PasswordRoute() {
  return (
    <>
      <PageHeader title="Change password" subtitle="Changing it signs you out on every other phone, tablet and computer." />
      <ChangePasswordForm />
    </>
  );
}
