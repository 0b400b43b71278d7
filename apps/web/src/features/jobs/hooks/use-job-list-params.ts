import { JOB_SORT_FIELDS, type JobListQuery } from '@benchproof/contracts';
import { isJobStatus, type JobStatus } from '@benchproof/domain';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router';
import type { JobListParams } from '../api/jobs';

type SortField = JobListQuery['sort'];
const isSortField = (v: string | null): v is SortField => (JOB_SORT_FIELDS as readonly string[]).includes(v ?? '');
/** Jobs per page of the list. */
export const JOBS_PAGE_SIZE = 20;

type Key = 'q' | 'mechanicId' | 'promisedAfter' | 'promisedBefore' | 'sort' | 'order' | 'page' | 'closed' | 'unpaid';

/** The list request the address bar asks for; the jobs route's loader warms the cache with the same key. */
export function jobListParams(search: URLSearchParams, pageSize: number = JOBS_PAGE_SIZE): JobListParams {
  const status = (search.get('status') ?? '').split(',').filter(isJobStatus);
  const sort = search.get('sort');
  const includeClosed = search.get('closed') === '1';
  return {
    q: search.get('q') ?? undefined,
    status: status.length ? status : undefined,
    open: status.length || includeClosed ? undefined : true,
    mechanicId: Number(search.get('mechanicId')) || undefined,
    promisedAfter: search.get('promisedAfter') ?? undefined,
    promisedBefore: search.get('promisedBefore') ?? undefined,
    readyUnpaid: search.get('unpaid') === '1' ? true : undefined,
    sort: isSortField(sort) ? sort : 'promisedOn',
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
    page: Number(search.get('page')) || 1,
    pageSize,
  };
}

/**
 * Jobs table filters kept in the address bar, so Back and a shared link show the same list.
 * By default only open jobs are listed; `closed=1` adds collected and cancelled ones,
 * and picking statuses lists exactly those.
 */
export function useJobListParams(pageSize: number = JOBS_PAGE_SIZE) {
  const [search, setSearch] = useSearchParams();
  const params = useMemo(() => jobListParams(search, pageSize), [search, pageSize]);
  const includeClosed = search.get('closed') === '1';

  const update = (patch: Partial<Record<Key, string | null>> & { status?: JobStatus[] }) => {
    setSearch(
      (prev) => {
        const next = new URLSearchParams(prev);
        for (const [k, v] of Object.entries(patch)) {
          const value = Array.isArray(v) ? v.join(',') : v;
          if (value) next.set(k, value);
          else next.delete(k);
        }
        if (!('page' in patch)) next.delete('page');
        return next;
      },
      { replace: true },
    );
  };
  return { params, includeClosed, update };
}
