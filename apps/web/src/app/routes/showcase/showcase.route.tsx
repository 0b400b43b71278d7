import { Stack } from '@mantine/core';
import { PageHeader } from '../../../components/page-header';
import { ShowcaseLibrary } from '../../../features/showcase';

export function ShowcaseRoute() {
  return (
    <Stack>
      <PageHeader title="Showcase" />
      <ShowcaseLibrary />
    </Stack>
  );
}
