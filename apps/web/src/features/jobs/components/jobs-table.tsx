import type { JobDto, JobListQuery } from '@benchproof/contracts';
import { Box, Group, Pagination, Select, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconSelector } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useJobs } from '../api/jobs';
import { useJobListParams } from '../hooks/use-job-list-params';
import { JobCards } from './job-cards';
import { jobBikeLabel } from './job-label';
import { JobFilters, type Option } from './job-filters';
import { JobStatusBadge } from './job-status-badge';
import { PromisedDate } from './promised-date';
import classes from './jobs.module.css';

type SortField = JobListQuery['sort'];
type Order = JobListQuery['order'];
interface Sort {
  field: SortField;
  order: Order;
}

const SORT_OPTIONS = [
  { value: 'promisedOn:asc', label: 'Promised soonest' },
  { value: 'promisedOn:desc', label: 'Promised latest' },
  { value: 'createdAt:desc', label: 'Newest booked in' },
  { value: 'createdAt:asc', label: 'Oldest booked in' },
  { value: 'number:asc', label: 'Job number' },
  { value: 'status:asc', label: 'Status' },
];

function SortHeader({ field, sort, onSort, children }: { field: SortField; sort: Sort; onSort: (s: Sort) => void; children: ReactNode }) {
  const dir = sort.field === field ? sort.order : null;
  const Icon = dir === 'asc' ? IconArrowUp : dir === 'desc' ? IconArrowDown : IconSelector;
  return (
    <Table.Th aria-sort={dir === 'asc' ? 'ascending' : dir === 'desc' ? 'descending' : 'none'}>
      <UnstyledButton className={classes.sortButton} onClick={() => onSort({ field, order: dir === 'asc' ? 'desc' : 'asc' })}>
        {children}
        <Icon size={16} aria-hidden />
      </UnstyledButton>
    </Table.Th>
  );
}

function JobRow({ job }: { job: JobDto }) {
  const navigate = useNavigate();
  return (
    <Table.Tr className={job.overdue ? classes.overdueRow : undefined} onClick={() => void navigate(`/jobs/${job.id}`)} style={{ cursor: 'pointer' }}>
      <Table.Td>
        <Link className={classes.rowLink} to={`/jobs/${job.id}`} onClick={(e) => e.stopPropagation()}>
          {job.number}
        </Link>
      </Table.Td>
      <Table.Td>
        <JobStatusBadge status={job.status} />
      </Table.Td>
      <Table.Td>
        <Text fw={600} size="sm">
          {jobBikeLabel(job)}
        </Text>
        <Text size="sm" c="dimmed">
          {job.customer.name}
        </Text>
      </Table.Td>
      <Table.Td>
        <Text size="sm">{job.mechanic?.name ?? '—'}</Text>
      </Table.Td>
      <Table.Td>
        <PromisedDate promisedOn={job.promisedOn} overdue={job.overdue} />
      </Table.Td>
    </Table.Tr>
  );
}

function DesktopTable({ jobs, sort, onSort }: { jobs: JobDto[]; sort: Sort; onSort: (s: Sort) => void }) {
  return (
    <Table.ScrollContainer minWidth={720}>
      <Table verticalSpacing="sm" highlightOnHover>
        <Table.Thead>
          <Table.Tr>
            <SortHeader field="number" sort={sort} onSort={onSort}>
              Job
            </SortHeader>
            <SortHeader field="status" sort={sort} onSort={onSort}>
              Status
            </SortHeader>
            <Table.Th>Bike and owner</Table.Th>
            <Table.Th>Mechanic</Table.Th>
            <SortHeader field="promisedOn" sort={sort} onSort={onSort}>
              Promised
            </SortHeader>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {jobs.map((j) => (
            <JobRow key={j.id} job={j} />
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/** The jobs table: filters in the address bar, paging and sort on the server, cards on phones. */
export function JobsTable({ mechanics, pageSize = 20 }: { mechanics: Option[]; pageSize?: number }) {
  const { params, includeClosed, update } = useJobListParams(pageSize);
  const jobs = useJobs(params);
  const data = jobs.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const sort: Sort = { field: params.sort ?? 'promisedOn', order: params.order ?? 'asc' };
  const onSort = (s: Sort) => update({ sort: s.field, order: s.order });
  return (
    <>
      <JobFilters params={params} includeClosed={includeClosed} update={update} mechanics={mechanics} />
      <QueryState isLoading={jobs.isLoading} error={jobs.error} />
      {data && data.items.length === 0 && (
        <Text c="dimmed" py="lg">
          No jobs match these filters.
        </Text>
      )}
      {data && data.items.length > 0 && (
        <>
          <Group justify="space-between" mb="xs">
            <Text size="sm" c="dimmed">
              {data.total} job{data.total === 1 ? '' : 's'}
            </Text>
            <Select
              hiddenFrom="sm"
              aria-label="Sort"
              data={SORT_OPTIONS}
              value={`${sort.field}:${sort.order}`}
              onChange={(v) => v && onSort({ field: v.split(':')[0] as SortField, order: v.split(':')[1] as Order })}
              allowDeselect={false}
              w={210}
            />
          </Group>
          <Box visibleFrom="sm">
            <DesktopTable jobs={data.items} sort={sort} onSort={onSort} />
          </Box>
          <Box hiddenFrom="sm">
            <JobCards jobs={data.items} />
          </Box>
          {pages > 1 && (
            <Group justify="center" mt="md">
              <Pagination total={pages} value={params.page ?? 1} onChange={(p) => update({ page: String(p) })} size="lg" />
            </Group>
          )}
        </>
      )}
    </>
  );
}
