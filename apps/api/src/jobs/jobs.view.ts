import type { BikeListItem, CustomerDto, FinalCheckDto, JobDetail, JobDto } from '@benchproof/contracts';
import { allowedTransitions, JOB_STATUS_LABELS, JOB_STATUSES, nextAction, type JobStatus } from '@benchproof/domain';
import { DONE_STATUSES, type FinalCheckRow, type JobListRow, type JobRow } from './jobs.repository';

/** What a job DTO needs besides the job row: owners, bikes and staff names looked up in batches. */
export interface SummaryContext {
  owners: Map<number, CustomerDto>;
  bikes: Map<number, BikeListItem>;
  staff: Map<number, string>;
  today: string;
}

/** The column that records when the job last entered each status. */
export const STATUS_TIME_FIELD: Record<JobStatus, keyof JobRow> = {
  booked_in: 'bookedInAt',
  on_stand: 'onStandAt',
  waiting_owner: 'waitingOwnerAt',
  in_work: 'inWorkAt',
  final_check: 'finalCheckAt',
  ready: 'readyAt',
  collected: 'collectedAt',
  cancelled: 'cancelledAt',
};

/** Promised day before today (shop day = UTC date of the clock) and not ready, collected or cancelled. */
export const isOverdue = (job: Pick<JobRow, 'promisedOn' | 'status'>, today: string): boolean =>
  !!job.promisedOn && job.promisedOn < today && !DONE_STATUSES.includes(job.status);

const person = (id: number | null, name: string | null | undefined) => (id ? { id, name: name ?? '' } : null);
const staffMember = (id: number | null, staff: Map<number, string>) => person(id, id ? staff.get(id) : undefined);

/** A list row from the joined read model (owner, bike and mechanic names come with the row). */
export function toJobListDto(row: JobListRow, today: string, dueMinor: number | null = null): JobDto {
  // One object per row, written out (the list's hot path: no spread of an intermediate object).
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    mechanic: person(row.mechanicId, row.mechanicName),
    promisedOn: row.promisedOn ?? '',
    reportedSymptoms: row.reportedSymptoms,
    createdAt: row.createdAt.toISOString(),
    overdue: isOverdue(row, today),
    dueMinor,
    customer: { id: row.customerId, name: row.ownerName },
    bike: { id: row.bikeId, maker: row.bikeMaker, model: row.bikeModel, colour: row.bikeColour || null, serialNumber: row.bikeSerial || null },
  };
}

type ListedJob = Pick<JobRow, 'id' | 'number' | 'status' | 'mechanicId' | 'promisedOn' | 'reportedSymptoms' | 'createdAt'>;

function baseDto(job: ListedJob, mechanicName: string | null | undefined, today: string): Omit<JobDto, 'customer' | 'bike'> {
  return {
    id: job.id,
    number: job.number,
    status: job.status,
    mechanic: person(job.mechanicId, mechanicName),
    promisedOn: job.promisedOn ?? '',
    reportedSymptoms: job.reportedSymptoms,
    createdAt: job.createdAt.toISOString(),
    overdue: isOverdue(job, today),
    dueMinor: null,
  };
}

export function toJobDto(job: JobRow, ctx: SummaryContext): JobDto {
  const bike = ctx.bikes.get(job.bikeId);
  return {
    ...baseDto(job, job.mechanicId ? ctx.staff.get(job.mechanicId) : null, ctx.today),
    customer: { id: job.customerId, name: ctx.owners.get(job.customerId)?.name ?? '' },
    bike: { id: job.bikeId, maker: bike?.maker ?? '', model: bike?.model ?? '', colour: bike?.colour ?? null, serialNumber: bike?.serialNumber ?? null },
  };
}

export function toFinalCheckDto(row: FinalCheckRow, staff: Map<number, string>): FinalCheckDto {
  return {
    id: row.id,
    checker: { id: row.checkerId, name: staff.get(row.checkerId) ?? '' },
    passed: row.passed,
    items: row.items ?? {},
    testRideNotes: row.testRideNotes,
    note: row.notes || null,
    at: row.at.toISOString(),
  };
}

export function toDetail(job: JobRow, ctx: SummaryContext, extra: { finalCheck: FinalCheckRow | undefined; finalCheckSecondPerson: boolean }): JobDetail {
  const bike = ctx.bikes.get(job.bikeId);
  const customer = ctx.owners.get(job.customerId);
  if (!bike || !customer) throw new Error(`Job ${job.id} points at a missing bike or customer`);
  const times = Object.fromEntries(JOB_STATUSES.map((s) => [s, (job[STATUS_TIME_FIELD[s]] as Date | null)?.toISOString() ?? null])) as JobDetail['statusTimes'];
  return {
    ...toJobDto(job, ctx),
    statusLabel: JOB_STATUS_LABELS[job.status],
    bikeDetail: bike,
    customerDetail: customer,
    finalChecker: staffMember(job.finalCheckerId, ctx.staff),
    nextAction: nextAction(job.status),
    allowedTransitions: allowedTransitions(job.status).map((t) => ({ to: t.to, label: t.label, primary: t.primary })),
    statusTimes: times,
    finalCheck: extra.finalCheck ? toFinalCheckDto(extra.finalCheck, ctx.staff) : null,
    finalCheckSecondPerson: extra.finalCheckSecondPerson,
    collectedWithoutReport: job.collectedWithoutReport,
  };
}
