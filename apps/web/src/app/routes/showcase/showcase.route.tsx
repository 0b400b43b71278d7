import { Stack } from '@mantine/core';
import { PageHeader } from '../../../components/page-header';
import { useCan } from '../../../features/auth';
import { ShowcaseLibrary } from '../../../features/showcase';

/** Managers curate (favourites, captions); the desk browses and exports where the shop allows it (the route's loader). */
export function ShowcaseRoute() {
  const can = useCan();
  return (
    <Stack>
      <PageHeader title="Showcase" />
      <ShowcaseLibrary canManage={can('showcase.manage')} />
    </Stack>
  );
}
