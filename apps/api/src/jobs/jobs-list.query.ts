import type { JobListQuery } from '@benchproof/contracts';
import { JOB_STATUSES, TERMINAL_STATUSES, type JobStatus } from '@benchproof/domain';
import { and, asc, count, desc, eq, gte, inArray, isNull, lt, lte, or, sql, type SQL } from 'drizzle-orm';
import { ftsPrefixQuery, PreparedPages, type Db } from '../core/db';
import { bikes, customers, jobs, OPEN_STATUSES_SQL, users } from '../db/schema';

/** Statuses in which a passed promised day no longer counts as overdue. */
export const DONE_STATUSES: JobStatus[] = ['ready', 'collected', 'cancelled'];
const NOT_DONE = JOB_STATUSES.filter((st) => !DONE_STATUSES.includes(st));
const OPEN = JOB_STATUSES.filter((st) => !TERMINAL_STATUSES.includes(st));
if (OPEN.map((st) => `'${st}'`).join(', ') !== OPEN_STATUSES_SQL) throw new Error('OPEN_STATUSES_SQL (jobs.table.ts) differs from the domain open statuses');
/** Written as literals so SQLite can use the open-jobs partial index (it does not match bound values). */
const OPEN_LITERAL = sql`${jobs.status} IN (${sql.raw(OPEN_STATUSES_SQL)})`;

/** A jobs-list row: the columns the list shows, with owner, bike and mechanic names joined in (a read model). */
export interface JobListRow {
  id: number;
  number: string;
  status: JobStatus;
  promisedOn: string | null;
  reportedSymptoms: string;
  createdAt: Date;
  mechanicId: number | null;
  mechanicName: string | null;
  customerId: number;
  ownerName: string;
  bikeId: number;
  bikeMaker: string;
  bikeModel: string;
  bikeColour: string;
  bikeSerial: string;
}

const LIST_COLUMNS = {
  id: jobs.id,
  number: jobs.number,
  status: jobs.status,
  promisedOn: jobs.promisedOn,
  reportedSymptoms: jobs.reportedSymptoms,
  createdAt: jobs.createdAt,
  mechanicId: jobs.mechanicId,
  mechanicName: users.name,
  customerId: jobs.customerId,
  ownerName: customers.name,
  bikeId: jobs.bikeId,
  bikeMaker: bikes.maker,
  bikeModel: bikes.model,
  bikeColour: bikes.colour,
  bikeSerial: bikes.serialNumber,
};

const SORT_COLUMN = { promisedOn: jobs.promisedOn, createdAt: jobs.createdAt, number: jobs.number, status: jobs.status } as const;

export interface JobSearch {
  query: JobListQuery;
  today: string;
  /** With the "ready, unpaid" filter: the ready jobs with money due (the payments feature works them out). */
  readyUnpaidIds?: number[];
}

const p = (name: string) => sql.placeholder(name);

/** Which filters are present and how the page is sorted: everything that changes the SQL, none of the values. */
const shapeOf = (f: JobListQuery, text: boolean): string =>
  [f.status?.length ?? 0, !!f.mechanicId, !!f.promisedAfter, !!f.promisedBefore, f.overdue, f.open, !!f.readyUnpaid, text, f.sort, f.order].join('|');

/**
 * Status filters are written as IN lists (never NOT IN) so the (shop, status, promised, id)
 * index serves them; free text goes through the job_search FTS5 index.
 */
function filters(f: JobListQuery, text: boolean): SQL | undefined {
  const overdue = and(lt(jobs.promisedOn, p('today')), inArray(jobs.status, NOT_DONE));
  const notOverdue = or(gte(jobs.promisedOn, p('today')), inArray(jobs.status, DONE_STATUSES), isNull(jobs.promisedOn));
  return and(
    eq(jobs.shopId, p('shopId')),
    f.status?.length
      ? inArray(
          jobs.status,
          f.status.map((_, i) => p(`status${i}`)),
        )
      : undefined,
    f.mechanicId ? eq(jobs.mechanicId, p('mechanicId')) : undefined,
    f.promisedAfter ? gte(jobs.promisedOn, p('promisedAfter')) : undefined,
    f.promisedBefore ? lte(jobs.promisedOn, p('promisedBefore')) : undefined,
    f.overdue === undefined ? undefined : f.overdue ? overdue : notOverdue,
    f.open === undefined ? undefined : f.open ? OPEN_LITERAL : inArray(jobs.status, [...TERMINAL_STATUSES]),
    text ? sql`${jobs.id} IN (SELECT rowid FROM job_search WHERE job_search MATCH ${p('text')})` : undefined,
    f.readyUnpaid ? and(eq(jobs.status, 'ready'), sql`${jobs.id} IN (SELECT value FROM json_each(${p('readyUnpaidIds')}))`) : undefined,
  );
}

function valuesOf(shopId: number, { query: f, today, readyUnpaidIds }: JobSearch, text: string | null): Record<string, unknown> {
  const values: Record<string, unknown> = {
    ...{ shopId, today, text, mechanicId: f.mechanicId, promisedAfter: f.promisedAfter, promisedBefore: f.promisedBefore },
    readyUnpaidIds: JSON.stringify(readyUnpaidIds ?? []),
    ...{ limit: f.pageSize, offset: (f.page - 1) * f.pageSize },
  };
  f.status?.forEach((st, i) => (values[`status${i}`] = st));
  return values;
}

/**
 * The jobs list in two prepared statements per filter shape: the matching total (a covering
 * index count) and one page. The page picks its ids from the index first, then joins owner,
 * bike and mechanic for those rows only, so a deep page does not join every row it skips.
 */
export class JobsListQuery {
  private readonly prepared = new PreparedPages<JobListRow>();

  constructor(private readonly db: Db) {}

  page(shopId: number, s: JobSearch): { rows: JobListRow[]; total: number } {
    const text = s.query.q ? ftsPrefixQuery(s.query.q) : null;
    if (s.query.q && text === null) return { rows: [], total: 0 };
    return this.prepared.run(shapeOf(s.query, text !== null), valuesOf(shopId, s, text), {
      total: () => this.buildTotal(s.query, text !== null),
      page: () => this.buildPage(s.query, text !== null),
    });
  }

  private buildTotal(f: JobListQuery, text: boolean) {
    return this.db.select({ n: count() }).from(jobs).where(filters(f, text)).prepare();
  }

  private buildPage(f: JobListQuery, text: boolean) {
    // Same-day (same value) jobs: oldest booking first, so an index ending in id serves the page unsorted.
    const order = [(f.order === 'desc' ? desc : asc)(SORT_COLUMN[f.sort]), asc(jobs.id)];
    const pageIds = this.db
      .select({ id: jobs.id })
      .from(jobs)
      .where(filters(f, text))
      .orderBy(...order)
      .limit(p('limit'))
      .offset(p('offset'));
    return this.db
      .select(LIST_COLUMNS)
      .from(jobs)
      .innerJoin(customers, eq(customers.id, jobs.customerId))
      .innerJoin(bikes, eq(bikes.id, jobs.bikeId))
      .leftJoin(users, and(eq(users.id, jobs.mechanicId), eq(users.shopId, jobs.shopId)))
      .where(inArray(jobs.id, pageIds))
      .orderBy(...order)
      .prepare();
  }
}
