import { Alert } from '@mantine/core';
import { IconConfetti } from '@tabler/icons-react';
import { useSearchParams } from 'react-router';
import { PageHeader } from '../../../components/page-header';
import { ImportScreen } from '../../../features/imports';

/** Managers bring their customers and bikes in from a spreadsheet or another program's CSV export. */
export function ImportRoute() {
  const [params] = useSearchParams();
  return (
    <>
      {params.get('welcome') && (
        <Alert color="teal" variant="light" icon={<IconConfetti />} mb="md" title="Your workshop is open">
          Bring in the customers and bikes you already have, or skip this and book in your first bike from Jobs. Invite your staff under Users & roles.
        </Alert>
      )}
      <PageHeader
        title="Import customers and bikes"
        subtitle="Save your list as CSV (comma or semicolon). Nothing is written until you press Import; rows with problems are left out."
      />
      <ImportScreen sampleUrl="/customers-import-sample.csv" />
    </>
  );
}
