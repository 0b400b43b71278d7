import {
  JOB_STATUSES,
  JOB_STATUS_LABELS,
  JOB_TRANSITIONS,
  allowedNextStatuses,
  allowedTransitions,
  canTransition,
  finalCheckAllowed,
  isJobStatus,
  isTerminalStatus,
  nextAction,
  statusAfterOwnerAnswer,
  type JobStatus,
} from './job-status';

describe('job statuses (DESIGN.md)', () => {
  it('are in flow order with the screen labels', () => {
    expect(JOB_STATUSES.map((s) => JOB_STATUS_LABELS[s])).toEqual([
      'Booked in',
      'On the stand',
      'Waiting on owner',
      'In work',
      'Final check',
      'Ready',
      'Collected',
      'Cancelled',
    ]);
  });

  it('recognises statuses', () => {
    expect(isJobStatus('in_work')).toBe(true);
    expect(isJobStatus('waiting_parts')).toBe(false);
    expect(isJobStatus(3)).toBe(false);
  });
});

describe('transitions (defined once in JOB_TRANSITIONS)', () => {
  // Flow from DESIGN.md; the backward steps are common practice, no source.
  it.each<[JobStatus, JobStatus, boolean]>([
    ['booked_in', 'on_stand', true],
    ['on_stand', 'waiting_owner', true],
    ['on_stand', 'in_work', true],
    ['waiting_owner', 'in_work', true],
    ['waiting_owner', 'on_stand', true],
    ['in_work', 'waiting_owner', true],
    ['in_work', 'final_check', true],
    ['final_check', 'in_work', true],
    ['final_check', 'ready', true],
    ['ready', 'in_work', true],
    ['ready', 'collected', true],
    ['booked_in', 'ready', false],
    ['booked_in', 'in_work', false],
    ['in_work', 'ready', false],
    ['in_work', 'collected', false],
    ['final_check', 'collected', false],
    ['collected', 'in_work', false],
    ['cancelled', 'booked_in', false],
    ['on_stand', 'on_stand', false],
  ])('%s → %s: %s', (from, to, allowed) => {
    expect(canTransition(from, to)).toBe(allowed);
  });

  it('cancel is possible from every open status and the closed ones are terminal', () => {
    for (const s of JOB_STATUSES) {
      const terminal = s === 'collected' || s === 'cancelled';
      expect(isTerminalStatus(s)).toBe(terminal);
      expect(canTransition(s, 'cancelled')).toBe(!terminal);
      if (terminal) expect(allowedNextStatuses(s)).toEqual([]);
    }
  });

  it('has no duplicate edges and exactly one primary step per open status', () => {
    const edges = JOB_TRANSITIONS.map((t) => `${t.from}>${t.to}`);
    expect(new Set(edges).size).toBe(edges.length);
    for (const s of JOB_STATUSES) {
      const primaries = JOB_TRANSITIONS.filter((t) => t.from === s && t.primary);
      expect(primaries.length).toBe(isTerminalStatus(s) ? 0 : 1);
    }
  });

  it('lists the primary step first', () => {
    expect(allowedNextStatuses('final_check')).toEqual(['ready', 'in_work', 'cancelled']);
    expect(allowedTransitions('final_check')[1].label).toBe('Check failed — back to work');
  });

  it('every status except booked_in is reachable from booked_in', () => {
    const seen = new Set<JobStatus>(['booked_in']);
    const queue: JobStatus[] = ['booked_in'];
    while (queue.length > 0) {
      for (const next of allowedNextStatuses(queue.shift() as JobStatus)) {
        if (!seen.has(next)) {
          seen.add(next);
          queue.push(next);
        }
      }
    }
    expect([...seen].sort()).toEqual([...JOB_STATUSES].sort());
  });
});

describe('nextAction (job header button)', () => {
  it.each<[JobStatus, { to: JobStatus; label: string } | null]>([
    ['booked_in', { to: 'on_stand', label: 'Put on the stand' }],
    ['on_stand', { to: 'waiting_owner', label: 'Ask the owner' }],
    ['waiting_owner', { to: 'in_work', label: 'Start work' }],
    ['in_work', { to: 'final_check', label: 'Send to final check' }],
    ['final_check', { to: 'ready', label: 'Mark ready' }],
    ['ready', { to: 'collected', label: 'Hand back' }],
    ['collected', null],
    ['cancelled', null],
  ])('%s', (status, action) => {
    expect(nextAction(status)).toEqual(action);
    if (action) expect(canTransition(status, action.to)).toBe(true);
  });
});

describe('finalCheckAllowed', () => {
  it.each([
    { requiresSecondPerson: true, mechanicId: 7, checkerId: 7, allowed: false },
    { requiresSecondPerson: true, mechanicId: 7, checkerId: 8, allowed: true },
    { requiresSecondPerson: true, mechanicId: null, checkerId: 8, allowed: true },
    { requiresSecondPerson: false, mechanicId: 7, checkerId: 7, allowed: true },
  ])('second person $requiresSecondPerson, mechanic $mechanicId, checker $checkerId → $allowed', (c) => {
    expect(finalCheckAllowed(c)).toBe(c.allowed);
  });
});

describe('statusAfterOwnerAnswer', () => {
  it.each([
    ['waiting_owner', 0, 'in_work'],
    ['waiting_owner', 1, null],
    ['on_stand', 0, null],
    ['in_work', 0, null],
    ['collected', 0, null],
  ] as const)('%s with %i pending → %s', (status, pending, expected) => {
    expect(statusAfterOwnerAnswer(status, pending)).toBe(expected);
  });
});
