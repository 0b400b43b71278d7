import { ROLE_LABELS, ROLES, roleCan, type Action } from '@benchproof/contracts';
import { Alert, Button } from '@mantine/core';
import { IconPlus } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router';
import { PageHeader } from '../../../components/page-header';
import { useCan, useSession } from '../../../features/auth';
import { JobsTable } from '../../../features/jobs';
import { useShopSettings } from '../../../features/shop-settings';
import { useStaff } from '../staff';

/** Why a page sent the user here (guards.ts adds `?denied=<action>`): who may open it. */
function DeniedNotice() {
  const [search, setSearch] = useSearchParams();
  const { data: me } = useSession();
  const action = search.get('denied') as Action | null;
  if (!action) return null;
  // The showcase may be closed to the desk by the shop even though the role could open it.
  const who = ROLES.filter((r) => roleCan(r, action) && r !== me?.role).map((r) => ROLE_LABELS[r].toLowerCase());
  const close = () =>
    setSearch(
      (s) => {
        s.delete('denied');
        return s;
      },
      { replace: true },
    );
  return (
    <Alert color="orange" role="alert" title="That page is not open to your role" withCloseButton closeButtonLabel="Dismiss" onClose={close} mb="md">
      {who.length
        ? `Only ${who.join(' and ')} accounts can open it, so you are on the jobs list instead.`
        : 'Your role cannot open it, so you are on the jobs list instead.'}{' '}
      Ask a manager if you need it.
    </Alert>
  );
}

export function JobsRoute() {
  const { mechanics } = useStaff();
  const canBook = useCan()('jobs.book_in');
  const currency = useShopSettings().data?.currency;
  return (
    <>
      <PageHeader
        title="Jobs"
        subtitle="Every bike in the workshop. Overdue jobs are marked with a clock and the word Overdue."
        actions={
          canBook && (
            <Button component={Link} to="/jobs/new" size="lg" leftSection={<IconPlus />}>
              Book a bike in
            </Button>
          )
        }
      />
      <DeniedNotice />
      <JobsTable mechanics={mechanics} currency={currency} />
    </>
  );
}
