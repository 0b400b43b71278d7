import type { JobDto, JobListQuery } from '@benchproof/contracts';
import { formatMoney } from '@benchproof/domain';
import { Box, Group, NativeSelect, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconSelector } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';
import { Pager } from '../../../components/pager';
import { QueryState } from '../../../components/query-state';
import { useJobs } from '../api/jobs';
import { JOBS_PAGE_SIZE, useJobListParams } from '../hooks/use-job-list-params';
import { JobCards } from './job-cards';
import { jobBikeLabel } from './job-label';
import { filtersActive, JobFilters, type Option } from './job-filters';
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
    <th aria-sort={dir === 'asc' ? 'ascending' : dir === 'desc' ? 'descending' : 'none'}>
      <UnstyledButton className={classes.sortButton} onClick={() => onSort({ field, order: dir === 'asc' ? 'desc' : 'asc' })}>
        {children}
        <Icon size={16} aria-hidden />
      </UnstyledButton>
    </th>
  );
}

/** Money still due, or a dash; a row with nothing charged yet shows nothing. */
const dueLabel = (due: number | null, currency: string): string =>
  due && due > 0 ? formatMoney(due, currency) : due !== null && due < 0 ? `${formatMoney(-due, currency)} to refund` : '—';

function JobRow({ job, currency }: { job: JobDto; currency: string }) {
  const navigate = useNavigate();
  return (
    <tr className={job.overdue ? classes.overdueRow : undefined} onClick={() => void navigate(`/jobs/${job.id}`)} style={{ cursor: 'pointer' }}>
      <td>
        <Link className={classes.rowLink} to={`/jobs/${job.id}`} onClick={(e) => e.stopPropagation()}>
          {job.number}
        </Link>
      </td>
      <td>
        <JobStatusBadge status={job.status} />
      </td>
      <td>
        <Text fw={600} size="sm">
          {jobBikeLabel(job)}
        </Text>
        <Text size="sm" c="dimmed">
          {job.customer.name}
        </Text>
      </td>
      <td>
        <Text size="sm">{job.mechanic?.name ?? '—'}</Text>
      </td>
      <td>
        <PromisedDate promisedOn={job.promisedOn} overdue={job.overdue} />
      </td>
      <td>
        <Text size="sm">{dueLabel(job.dueMinor, currency)}</Text>
      </td>
    </tr>
  );
}

function DesktopTable({ jobs, sort, onSort, currency }: { jobs: JobDto[]; sort: Sort; onSort: (s: Sort) => void; currency: string }) {
  return (
    // Plain table markup styled like Mantine's Table (jobs.module.css): Mantine's Table always brings its ScrollArea.
    <div className={classes.tableScroll}>
      <table className={classes.table}>
        <thead>
          <tr>
            <SortHeader field="number" sort={sort} onSort={onSort}>
              Job
            </SortHeader>
            <SortHeader field="status" sort={sort} onSort={onSort}>
              Status
            </SortHeader>
            <th>Bike and owner</th>
            <th>Mechanic</th>
            <SortHeader field="promisedOn" sort={sort} onSort={onSort}>
              Promised
            </SortHeader>
            <th>Due</th>
          </tr>
        </thead>
        <tbody>
          {jobs.map((j) => (
            <JobRow key={j.id} job={j} currency={currency} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** An empty list: a new workshop's is not the filters' doing. */
const NoJobs = ({ filtered }: { filtered: boolean }) => (
  <Text c="dimmed" py="lg">
    {filtered ? 'No jobs match these filters.' : 'No bikes in the workshop right now. Book one in with the button above.'}
  </Text>
);

/** The jobs table: filters in the address bar, paging and sort on the server, cards on phones. */
export function JobsTable({ mechanics, pageSize = JOBS_PAGE_SIZE, currency = 'EUR' }: { mechanics: Option[]; pageSize?: number; currency?: string }) {
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
      {data && data.items.length === 0 && <NoJobs filtered={filtersActive(params, includeClosed)} />}
      {data && data.items.length > 0 && (
        <>
          <Group justify="space-between" mb="xs">
            <Text size="sm" c="dimmed">
              {data.total} job{data.total === 1 ? '' : 's'}
            </Text>
            <NativeSelect
              hiddenFrom="sm"
              aria-label="Sort"
              data={SORT_OPTIONS}
              value={`${sort.field}:${sort.order}`}
              onChange={(e) => {
                const [field, order] = e.currentTarget.value.split(':');
                onSort({ field: field as SortField, order: order as Order });
              }}
              w={210}
            />
          </Group>
          <Box visibleFrom="sm">
            <DesktopTable jobs={data.items} sort={sort} onSort={onSort} currency={currency} />
          </Box>
          <Box hiddenFrom="sm">
            <JobCards jobs={data.items} currency={currency} />
          </Box>
          {pages > 1 && (
            <Box mt="md">
              <Pager total={pages} value={params.page ?? 1} onChange={(p) => update({ page: String(p) })} />
            </Box>
          )}
        </>
      )}
    </>
  );
}
