import { Divider, Stack } from '@mantine/core';
import { PageHeader } from '../../../components/page-header';
import { useCan } from '../../../features/auth';
import { BackupsPanel } from '../../../features/backups';
import { ShopExportCard } from '../../../features/data-export';

/** /settings/data — backups of the server's records, and the shop's full export (manager). */
export function DataRoute() {
  const can = useCan();
  return (
    <>
      <PageHeader title="Backups & export" subtitle="Copies of the workshop’s records, and all of the shop’s data in one download." />
      <Stack gap="lg">
        {can('backups.manage') && <BackupsPanel />}
        <Divider />
        {can('shop.export') && <ShopExportCard />}
      </Stack>
    </>
  );
}
