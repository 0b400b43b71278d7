import { JOB_STATUSES, JOB_STATUS_LABELS, type JobStatus } from '@benchproof/domain';
import { Button, Chip, Group, Select, SimpleGrid, Stack, Switch, TextInput, useMatches } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useDebouncedCallback } from '@mantine/hooks';
import { IconSearch, IconX } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import type { JobListParams } from '../api/jobs';
import type { useJobListParams } from '../hooks/use-job-list-params';

export interface Option {
  value: string;
  label: string;
}

interface Props {
  params: JobListParams;
  includeClosed: boolean;
  update: ReturnType<typeof useJobListParams>['update'];
  mechanics: Option[];
}

function SearchBox({ initial, onSearch }: { initial: string; onSearch: (q: string) => void }) {
  const [value, setValue] = useState(initial);
  const debounced = useDebouncedCallback(onSearch, 300);
  // A search still waiting when the user taps a result must not pull them back to the list.
  useEffect(() => () => debounced.cancel(), [debounced]);
  return (
    <TextInput
      aria-label="Search jobs"
      placeholder="Job number, owner or bike"
      leftSection={<IconSearch size={18} />}
      value={value}
      onChange={(e) => {
        setValue(e.currentTarget.value);
        debounced(e.currentTarget.value.trim());
      }}
      onBlur={() => debounced.flush()}
      size="md"
    />
  );
}

function StatusChips({ value, onChange }: { value: JobStatus[]; onChange: (v: JobStatus[]) => void }) {
  const chipWrap = useMatches<'nowrap' | 'wrap'>({ base: 'nowrap', sm: 'wrap' });
  return (
    <Chip.Group multiple value={value} onChange={onChange}>
      {/* One swipeable row on a phone, so the jobs start near the top of the screen. */}
      <Group gap={8} role="group" aria-label="Filter by status" wrap={chipWrap} style={{ overflowX: 'auto', paddingBottom: 4 }}>
        {JOB_STATUSES.map((s) => (
          <Chip key={s} value={s} size="md" radius="sm">
            {JOB_STATUS_LABELS[s]}
          </Chip>
        ))}
      </Group>
    </Chip.Group>
  );
}

/** Status chips, mechanic, promised range and free text for the jobs table. */
export function JobFilters({ params, includeClosed, update, mechanics }: Props) {
  const range: [string | null, string | null] = [params.promisedAfter ?? null, params.promisedBefore ?? null];
  const active = Boolean(params.q || params.status?.length || params.mechanicId || params.promisedAfter || params.promisedBefore || includeClosed);
  const byStatus = Boolean(params.status?.length);
  return (
    <Stack gap="sm" mb="md">
      <StatusChips value={params.status ?? []} onChange={(status) => update({ status })} />
      <Switch
        label="Include collected and cancelled jobs"
        description={byStatus ? 'The chosen statuses decide which jobs are listed.' : 'Off: only jobs still in the workshop.'}
        checked={includeClosed || byStatus}
        disabled={byStatus}
        onChange={(e) => update({ closed: e.currentTarget.checked ? '1' : null })}
        size="md"
      />
      <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
        <SearchBox initial={params.q ?? ''} onSearch={(q) => update({ q })} />
        <Select
          aria-label="Mechanic"
          placeholder="Any mechanic"
          data={mechanics}
          value={params.mechanicId ? String(params.mechanicId) : null}
          onChange={(v) => update({ mechanicId: v })}
          clearable
        />
        <DatePickerInput
          type="range"
          aria-label="Promised between"
          placeholder="Promised between…"
          value={range}
          onChange={([from, to]) => update({ promisedAfter: from, promisedBefore: to })}
          clearable
          size="md"
        />
      </SimpleGrid>
      {active && (
        <Group>
          <Button
            variant="subtle"
            leftSection={<IconX size={18} />}
            onClick={() => update({ q: null, status: [], mechanicId: null, promisedAfter: null, promisedBefore: null, closed: null })}
          >
            Clear filters
          </Button>
        </Group>
      )}
    </Stack>
  );
}
