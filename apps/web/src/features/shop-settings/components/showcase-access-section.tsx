import { Paper, Stack, Switch, Text, Title } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import type { SettingsValues } from './settings-values';

/** Who may open the showcase besides the manager; saved with the rest of the settings. */
export function ShowcaseAccessSection({ form }: { form: UseFormReturnType<SettingsValues> }) {
  return (
    <Paper withBorder p="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          Showcase
        </Title>
        <Switch
          size="lg"
          label="Front desk may open the showcase and export from it"
          description="Managers always can. Captions, favourites and the take-down list stay with managers."
          {...form.getInputProps('showcaseDeskAccess', { type: 'checkbox' })}
        />
        <Text size="sm" c="dimmed">
          Only pairs whose owner agreed to marketing use are ever shown, and every export is recorded. Exports carry the shop logo (Branding) as a watermark, or
          the shop name when there is no logo.
        </Text>
      </Stack>
    </Paper>
  );
}
