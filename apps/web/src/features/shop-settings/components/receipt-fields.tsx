import type { ShopSettingsDto } from '@benchproof/contracts';
import { COUNTRY_CODES } from '@benchproof/domain';
import { Paper, Select, SimpleGrid, Stack, TextInput, Title } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { useMemo } from 'react';
import type { SettingsValues } from './settings-values';

/** Country names in the shop's date locale (CLDR through Intl); the code stays visible so it can be typed to search. */
function useCountryOptions(locale: string): { value: string; label: string }[] {
  return useMemo(() => {
    const names = new Intl.DisplayNames([locale, 'en'], { type: 'region', fallback: 'code' });
    return COUNTRY_CODES.map((code) => ({ value: code, label: `${names.of(code) ?? code} (${code})` })).sort((a, b) => a.label.localeCompare(b.label, locale));
  }, [locale]);
}

/** Country and tax number: printed on receipts; the country also reads phone numbers typed without a country code. */
export function ReceiptFields({ form, settings }: { form: UseFormReturnType<SettingsValues>; settings: ShopSettingsDto }) {
  const options = useCountryOptions(settings.dateLocale);
  return (
    <Paper withBorder p="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          Receipts
        </Title>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <Select
            label="Country"
            description="On receipts; phone numbers without a country code are read as this country's"
            searchable
            allowDeselect={false}
            nothingFoundMessage="No country by that name"
            data={options}
            size="md"
            {...form.getInputProps('country')}
          />
          <TextInput
            label="Tax number"
            description="Printed on receipts when set, e.g. your VAT number"
            maxLength={40}
            size="md"
            {...form.getInputProps('taxNumber')}
          />
        </SimpleGrid>
      </Stack>
    </Paper>
  );
}
