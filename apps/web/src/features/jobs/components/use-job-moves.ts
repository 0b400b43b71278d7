import type { JobStatus } from '@benchproof/domain';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useTransitionJob } from '../api/jobs';

export interface Move {
  to: JobStatus;
  label: string;
}

/** The message to show for a failed move; a handover refused for want of a report gets its own dialog instead. */
function moveError(error: unknown): string | null {
  if (!error) return null;
  if (error instanceof ApiError) return error.code === 'REPORT_NOT_SENT' ? null : error.message;
  return 'The move did not go through. Try again.';
}

/**
 * Moving a job: the move waiting for confirmation, the move itself, and what went wrong.
 * The last note is kept so a handover refused with REPORT_NOT_SENT can be confirmed without retyping it.
 */
export function useJobMoves(jobId: number) {
  const transition = useTransitionJob(jobId);
  const [confirm, setConfirm] = useState<Move | null>(null);
  const [pendingNote, setPendingNote] = useState('');
  const move = (to: JobStatus, note = '', confirmNoReport = false) => {
    setPendingNote(note);
    transition.mutate({ to, note, confirmNoReport }, { onSuccess: () => setConfirm(null) });
  };
  return {
    confirm,
    setConfirm,
    move,
    handOverWithoutReport: () => move('collected', pendingNote, true),
    pending: transition.isPending,
    noReport: transition.error instanceof ApiError && transition.error.code === 'REPORT_NOT_SENT',
    error: moveError(transition.error),
    dismissError: () => transition.reset(),
  };
}
