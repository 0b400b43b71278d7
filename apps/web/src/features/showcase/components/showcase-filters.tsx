import type { ShowcaseQuery } from '@benchproof/contracts';
import { MEDIA_AREAS, MEDIA_AREA_LABELS } from '@benchproof/domain';
import { Select, SimpleGrid, Stack, Switch, TextInput } from '@mantine/core';

const AREA_OPTIONS = MEDIA_AREAS.map((a) => ({ value: a, label: MEDIA_AREA_LABELS[a] }));

/** Area, date range and favourites; each change narrows the server's listing. */
export function ShowcaseFilters({ query, onChange }: { query: ShowcaseQuery; onChange: (patch: Partial<ShowcaseQuery>) => void }) {
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
        <TextInput size="md" type="date" label="From" value={query.from ?? ''} onChange={(e) => onChange({ from: e.currentTarget.value || undefined })} />
        <TextInput size="md" type="date" label="To" value={query.to ?? ''} onChange={(e) => onChange({ to: e.currentTarget.value || undefined })} />
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
