import type { MediaListQuery } from '@benchproof/contracts';
import {
  MEDIA_AREA_LABELS,
  MEDIA_AREAS,
  MEDIA_KIND_LABELS,
  MEDIA_KINDS,
  MEDIA_PHASE_LABELS,
  MEDIA_PHASES,
  type MediaArea,
  type MediaKind,
  type MediaPhase,
} from '@benchproof/domain';
import { Select, SimpleGrid, Switch } from '@mantine/core';

const opts = <T extends string>(values: readonly T[], labels: Readonly<Record<T, string>>) => values.map((v) => ({ value: v, label: labels[v] }));

/** Phase, area and kind filters (sent to the API); managers can also show deleted shots. */
export function MediaFilters({ value, onChange, canSeeDeleted }: { value: MediaListQuery; onChange: (q: MediaListQuery) => void; canSeeDeleted: boolean }) {
  const set = (patch: Partial<MediaListQuery>) => onChange({ ...value, ...patch });
  return (
    <SimpleGrid cols={{ base: 3, sm: canSeeDeleted ? 4 : 3 }} spacing="xs" maw={760}>
      <Select
        label="Phase"
        placeholder="All"
        clearable
        data={opts(MEDIA_PHASES, MEDIA_PHASE_LABELS)}
        value={value.phase ?? null}
        onChange={(v) => set({ phase: (v as MediaPhase) ?? undefined })}
      />
      <Select
        label="Area"
        placeholder="All"
        clearable
        data={opts(MEDIA_AREAS, MEDIA_AREA_LABELS)}
        value={value.area ?? null}
        onChange={(v) => set({ area: (v as MediaArea) ?? undefined })}
      />
      <Select
        label="Kind"
        placeholder="All"
        clearable
        data={opts(MEDIA_KINDS, MEDIA_KIND_LABELS)}
        value={value.kind ?? null}
        onChange={(v) => set({ kind: (v as MediaKind) ?? undefined })}
      />
      {canSeeDeleted && (
        <Switch
          size="md"
          mt={32}
          label="Show deleted"
          checked={value.includeDeleted === true}
          onChange={(e) => set({ includeDeleted: e.currentTarget.checked || undefined })}
        />
      )}
    </SimpleGrid>
  );
}
