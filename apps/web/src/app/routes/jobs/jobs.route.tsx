import { Button } from '@mantine/core';
import { IconPlus } from '@tabler/icons-react';
import { Link } from 'react-router';
import { PageHeader } from '../../../components/page-header';
import { useCan } from '../../../features/auth';
import { JobsTable } from '../../../features/jobs';
import { useShopSettings } from '../../../features/shop-settings';
import { useStaff } from '../staff';

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
      <JobsTable mechanics={mechanics} currency={currency} />
    </>
  );
}
