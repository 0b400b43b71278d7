import { JOB_STATUSES, JOB_STATUS_LABELS, type JobStatus } from '@benchproof/domain';
import { Button, Group, NativeSelect, Stack, Text, TextInput, useMatches } from '@mantine/core';
import { useDebouncedCallback } from '@mantine/hooks';
import { IconAdjustmentsHorizontal, IconCheck, IconSearch, IconX } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import type { JobListParams } from '../api/jobs';
import type { useJobListParams } from '../hooks/use-job-list-params';
import classes from './jobs.module.css';

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

/**
 * An on/off filter as a pill button with aria-pressed. The status filters and "include closed jobs" use it instead
 * of Chip and Switch: Button is on this screen anyway, and those two would add about 2.5 KB gzip to the jobs list's
 * first load.
 */
function FilterToggle({ on, onClick, disabled, children }: { on: boolean; onClick: () => void; disabled?: boolean; children: string }) {
  return (
    <Button
      size="sm"
      h={44}
      radius="xl"
      variant={on ? 'filled' : 'light'}
      color={on ? undefined : 'gray'}
      c={on || disabled ? undefined : 'var(--mantine-color-text)'}
      aria-pressed={on}
      disabled={disabled}
      leftSection={on ? <IconCheck size={16} aria-hidden /> : undefined}
      onClick={onClick}
      style={{ flexShrink: 0 }}
    >
      {children}
    </Button>
  );
}

function StatusChips({ value, onChange }: { value: JobStatus[]; onChange: (v: JobStatus[]) => void }) {
  const chipWrap = useMatches<'nowrap' | 'wrap'>({ base: 'nowrap', sm: 'wrap' });
  const toggle = (s: JobStatus) => onChange(value.includes(s) ? value.filter((v) => v !== s) : [...value, s]);
  return (
    // One swipeable row on a phone, so the jobs start near the top of the screen.
    <Group gap={8} role="group" aria-label="Filter by status" wrap={chipWrap} style={{ overflowX: 'auto', paddingBottom: 4 }}>
      {JOB_STATUSES.map((s) => (
        <FilterToggle key={s} on={value.includes(s)} onClick={() => toggle(s)}>
          {JOB_STATUS_LABELS[s]}
        </FilterToggle>
      ))}
    </Group>
  );
}

/**
 * The promised-date range as two native date boxes: the phone's own date picker (big targets, no typing),
 * and no calendar library on the jobs list's first screen.
 */
function PromisedRange({ from, to, update }: { from: string; to: string; update: Props['update'] }) {
  const box = (label: string, value: string, key: 'promisedAfter' | 'promisedBefore', bounds: { min?: string; max?: string }) => (
    <TextInput
      type="date"
      // A label above rather than inside the box: at 390 px an inner label leaves too little room for the date.
      label={`Promised ${label.toLowerCase()}`}
      value={value}
      {...bounds}
      onChange={(e) => update({ [key]: e.currentTarget.value || null })}
      size="md"
    />
  );
  return (
    <Group gap="xs" grow wrap="nowrap" align="flex-end">
      {box('From', from, 'promisedAfter', { max: to || undefined })}
      {box('To', to, 'promisedBefore', { min: from || undefined })}
    </Group>
  );
}

/** Whether any filter narrows the list (the default shows every job still in the workshop). */
export const filtersActive = (params: JobListParams, includeClosed: boolean): boolean =>
  Boolean(params.q || params.status?.length || params.mechanicId || params.promisedAfter || params.promisedBefore || includeClosed || params.readyUnpaid);

/** Closed jobs, ready-unpaid, mechanic and promised range: behind "More filters" on a phone. */
function MoreFilters({ params, includeClosed, update, mechanics }: Props) {
  const byStatus = Boolean(params.status?.length);
  return (
    <>
      <Group gap="sm">
        <FilterToggle on={includeClosed || byStatus} disabled={byStatus} onClick={() => update({ closed: includeClosed ? null : '1' })}>
          Include collected and cancelled jobs
        </FilterToggle>
        <FilterToggle on={!!params.readyUnpaid} onClick={() => update({ unpaid: params.readyUnpaid ? null : '1' })}>
          Ready, unpaid
        </FilterToggle>
        <Text size="sm" c="dimmed">
          {byStatus ? 'The chosen statuses decide which jobs are listed.' : 'Off: only jobs still in the workshop.'}
        </Text>
      </Group>
      <div className={classes.filterGrid}>
        <NativeSelect
          aria-label="Mechanic"
          data={[{ value: '', label: 'Any mechanic' }, ...mechanics]}
          value={params.mechanicId ? String(params.mechanicId) : ''}
          onChange={(e) => update({ mechanicId: e.currentTarget.value || null })}
          size="md"
        />
        <PromisedRange from={params.promisedAfter ?? ''} to={params.promisedBefore ?? ''} update={update} />
      </div>
    </>
  );
}

/** How many of the filters behind "More filters" are on: the phone's button says so while they are hidden. */
const hiddenActive = (params: JobListParams, includeClosed: boolean): number =>
  [includeClosed, params.readyUnpaid, params.mechanicId, params.promisedAfter || params.promisedBefore].filter(Boolean).length;

/**
 * Status chips, mechanic, promised range and free text for the jobs table. On a phone only the search box and
 * the status row show at first, so the first jobs are on the first screen; the rest opens under "More filters".
 */
export function JobFilters({ params, includeClosed, update, mechanics }: Props) {
  const active = filtersActive(params, includeClosed);
  // Read at first render, so a desktop never flashes the phone's button.
  const wide = useMatches({ base: false, sm: true }, { getInitialValueInEffect: false });
  const [opened, setOpened] = useState(false);
  const hidden = hiddenActive(params, includeClosed);
  const showMore = wide || opened;
  return (
    <Stack gap="sm" mb="md">
      <SearchBox initial={params.q ?? ''} onSearch={(q) => update({ q })} />
      <StatusChips value={params.status ?? []} onChange={(status) => update({ status })} />
      {!wide && (
        <Group>
          <Button
            variant="light"
            color="gray"
            c="var(--mantine-color-text)"
            h={44}
            leftSection={<IconAdjustmentsHorizontal size={18} aria-hidden />}
            aria-expanded={opened}
            onClick={() => setOpened((o) => !o)}
          >
            {opened ? 'Fewer filters' : hidden ? `More filters (${hidden} on)` : 'More filters'}
          </Button>
        </Group>
      )}
      {showMore && <MoreFilters params={params} includeClosed={includeClosed} update={update} mechanics={mechanics} />}
      {active && (
        <Group>
          <Button
            variant="subtle"
            leftSection={<IconX size={18} />}
            onClick={() => update({ q: null, status: [], mechanicId: null, promisedAfter: null, promisedBefore: null, closed: null, unpaid: null })}
          >
            Clear filters
          </Button>
        </Group>
      )}
    </Stack>
  );
}
