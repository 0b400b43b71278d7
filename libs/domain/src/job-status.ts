/** The statuses of a job (one workshop visit), in forward order (DESIGN.md). */
export const JOB_STATUSES = ['booked_in', 'on_stand', 'waiting_owner', 'in_work', 'final_check', 'ready', 'collected', 'cancelled'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Readonly<Record<JobStatus, string>> = {
  booked_in: 'Booked in',
  on_stand: 'On the stand',
  waiting_owner: 'Waiting on owner',
  in_work: 'In work',
  final_check: 'Final check',
  ready: 'Ready',
  collected: 'Collected',
  cancelled: 'Cancelled',
};

/** Statuses a job never leaves. */
export const TERMINAL_STATUSES: readonly JobStatus[] = ['collected', 'cancelled'];

export interface JobTransition {
  readonly from: JobStatus;
  readonly to: JobStatus;
  /** Button text, a verb phrase in the shop's voice. */
  readonly label: string;
  /** The one forward step offered as the job header's main button. */
  readonly primary: boolean;
}

const step = (from: JobStatus, to: JobStatus, label: string, primary = false): JobTransition => ({
  from,
  to,
  label,
  primary,
});

const NON_TERMINAL = JOB_STATUSES.filter((s) => !TERMINAL_STATUSES.includes(s));

/**
 * Every allowed status change, defined once. Forward flow plus the backward
 * steps a real bench needs (common practice, no source): a bike goes back in
 * the queue, the owner's answer needs another look on the stand, a new
 * finding mid-work needs the owner again, a failed final check goes back to
 * work, a bike marked ready is reopened. Any open job can be cancelled.
 */
export const JOB_TRANSITIONS: readonly JobTransition[] = [
  step('booked_in', 'on_stand', 'Put on the stand', true),
  step('on_stand', 'waiting_owner', 'Ask the owner', true),
  step('on_stand', 'in_work', 'Start work'),
  step('on_stand', 'booked_in', 'Back to the queue'),
  step('waiting_owner', 'in_work', 'Start work', true),
  step('waiting_owner', 'on_stand', 'Back on the stand'),
  step('in_work', 'final_check', 'Send to final check', true),
  step('in_work', 'waiting_owner', 'Ask the owner'),
  step('final_check', 'ready', 'Mark ready', true),
  step('final_check', 'in_work', 'Check failed — back to work'),
  step('ready', 'collected', 'Hand back', true),
  step('ready', 'in_work', 'Reopen work'),
  ...NON_TERMINAL.map((from) => step(from, 'cancelled', 'Cancel job')),
];

/** True when the job never leaves this status. */
export function isTerminalStatus(status: JobStatus): boolean {
  return TERMINAL_STATUSES.includes(status);
}

/** Type guard for untrusted strings. */
export function isJobStatus(value: unknown): value is JobStatus {
  return typeof value === 'string' && (JOB_STATUSES as readonly string[]).includes(value);
}

/** True when JOB_TRANSITIONS allows `from → to`. */
export function canTransition(from: JobStatus, to: JobStatus): boolean {
  return JOB_TRANSITIONS.some((t) => t.from === from && t.to === to);
}

/** The statuses reachable in one step, in JOB_TRANSITIONS order (primary first). */
export function allowedNextStatuses(from: JobStatus): JobStatus[] {
  return allowedTransitions(from).map((t) => t.to);
}

/** The transitions out of `from`, the primary one first. */
export function allowedTransitions(from: JobStatus): JobTransition[] {
  const out = JOB_TRANSITIONS.filter((t) => t.from === from);
  return [...out.filter((t) => t.primary), ...out.filter((t) => !t.primary)];
}

/** The main button of the job header: next status and its label, or null when the job is closed. */
export function nextAction(status: JobStatus): { to: JobStatus; label: string } | null {
  const primary = JOB_TRANSITIONS.find((t) => t.from === status && t.primary);
  return primary ? { to: primary.to, label: primary.label } : null;
}

/**
 * Final-check rule. When the shop requires a second person (shop setting),
 * the checker must be someone other than the mechanic who did the work;
 * otherwise anyone may sign the check off. With no mechanic recorded, any
 * checker counts as a second person.
 */
export function finalCheckAllowed(input: { requiresSecondPerson: boolean; mechanicId: number | null | undefined; checkerId: number }): boolean {
  if (!input.requiresSecondPerson) return true;
  const { mechanicId } = input;
  return mechanicId === null || mechanicId === undefined || mechanicId !== input.checkerId;
}

/**
 * Where the job goes once the owner has answered: a job waiting on the owner
 * moves on to work when no recommendation is pending any more (approved or
 * declined alike — the bench works on what was approved). Null when it stays.
 */
export function statusAfterOwnerAnswer(status: JobStatus, pendingCount: number): JobStatus | null {
  if (status !== 'waiting_owner' || pendingCount > 0) return null;
  return canTransition(status, 'in_work') ? 'in_work' : null;
}
