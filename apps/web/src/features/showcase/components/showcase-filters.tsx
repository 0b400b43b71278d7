import '@mantine/dates/styles.css';
import type { ShowcaseQuery } from '@benchproof/contracts';
import { MEDIA_AREAS, MEDIA_AREA_LABELS } from '@benchproof/domain';
import { Select, SimpleGrid, Stack, Switch } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useDates } from '../../../lib/dates';

const AREA_OPTIONS = MEDIA_AREAS.map((a) => ({ value: a, label: MEDIA_AREA_LABELS[a] }));

/** Area, date range and favourites; each change narrows the server's listing. */
export function ShowcaseFilters({ query, onChange }: { query: ShowcaseQuery; onChange: (patch: Partial<ShowcaseQuery>) => void }) {
  const dates = useDates();
  return (
    <Stack>
      <SimpleGrid cols={{ base: 1, sm: 3 }}>
        <Select
          size="md"
          label="Area"
          placeholder="All areas"
          clearable
          data={AREA_OPTIONS}
          value={query.area ?? null}
          onChange={(v) => onChange({ area: v ?? undefined })}
        />
        <DatePickerInput
          size="md"
          label="From"
          clearable
          valueFormat={dates.pickerFormat}
          firstDayOfWeek={dates.firstDayOfWeek}
          value={query.from ?? null}
          onChange={(v) => onChange({ from: v ?? undefined })}
        />
        <DatePickerInput
          size="md"
          label="To"
          clearable
          valueFormat={dates.pickerFormat}
          firstDayOfWeek={dates.firstDayOfWeek}
          value={query.to ?? null}
          onChange={(v) => onChange({ to: v ?? undefined })}
        />
      </SimpleGrid>
      <Switch
        size="lg"
        label="Favourites only"
        checked={query.favourites === 'true'}
        onChange={(e) => onChange({ favourites: e.currentTarget.checked ? 'true' : undefined })}
      />
    </Stack>
  );
}
