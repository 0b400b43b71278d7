import { Button, Stack, Text, Title } from '@mantine/core';
import { IconDownload } from '@tabler/icons-react';
import { shopExportUrl } from '../api/data-export';

/** The manager's "everything of the shop" download: records, original photos and videos, issued reports. */
export function ShopExportCard() {
  return (
    <Stack gap="sm">
      <Title order={3}>Export the shop’s data</Title>
      <Text size="sm">
        One zip file with every customer, bike and job, the checks, findings, decisions, consent records and the activity log, the original photos and videos,
        and every issued report. A list inside the zip (manifest.json) gives each file’s SHA-256 checksum, so anyone can check nothing changed. A shop with many
        photos makes a large file: start it on Wi-Fi.
      </Text>
      <Button size="lg" component="a" href={shopExportUrl} download leftSection={<IconDownload />}>
        Download everything (zip)
      </Button>
    </Stack>
  );
}
