import type { ShopSettingsDto } from '@benchproof/contracts';
import { Alert, Button, FileButton, Group, Image, Stack, Text } from '@mantine/core';
import { IconPhotoUp, IconTrash } from '@tabler/icons-react';
import { useRemoveLogo, useUploadLogo } from '../api/shop-settings';

/** The report logo: sent through the media intake, which checks it and makes a clean JPEG. */
export function LogoUpload({ settings }: { settings: ShopSettingsDto }) {
  const upload = useUploadLogo();
  const remove = useRemoveLogo();
  const error = upload.error ?? remove.error;
  return (
    <Stack gap="xs">
      <Text fw={600} size="sm">
        Logo
      </Text>
      <Group gap="sm" wrap="wrap">
        {settings.logo ? (
          <Image src={settings.logo.url} h={48} w="auto" fit="contain" alt="Current logo" />
        ) : (
          <Text size="sm" c="dimmed">
            No logo yet.
          </Text>
        )}
        <FileButton accept="image/jpeg,image/png,image/webp" onChange={(f) => f && upload.mutate(f)}>
          {(props) => (
            <Button {...props} size="md" variant="light" leftSection={<IconPhotoUp />} loading={upload.isPending}>
              {settings.logo ? 'Replace logo' : 'Upload logo'}
            </Button>
          )}
        </FileButton>
        {settings.logo && (
          <Button size="md" variant="subtle" color="red" leftSection={<IconTrash />} onClick={() => remove.mutate()} loading={remove.isPending}>
            Remove
          </Button>
        )}
      </Group>
      <Text size="xs" c="dimmed">
        JPEG, PNG or WebP. Printed on a white panel on the report cover.
      </Text>
      {error && <Alert color="red">{error.message}</Alert>}
    </Stack>
  );
}
