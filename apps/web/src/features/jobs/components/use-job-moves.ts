import type { JobStatus } from '@benchproof/domain';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useTransitionJob } from '../api/jobs';

export interface Move {
  to: JobStatus;
  label: string;
}

/** Hand-over refusals that desk answers in a dialog of their own, not as an error line. */
const ASKED = ['REPORT_NOT_SENT', 'UNPAID_BALANCE'];

/** The message to show for a failed move; a handover refused for want of a report or a payment gets its own dialog instead. */
function moveError(error: unknown): string | null {
  if (!error) return null;
  if (error instanceof ApiError) return ASKED.includes(error.code) ? null : error.message;
  return 'The move did not go through. Try again.';
}

/**
 * Moving a job: the move waiting for confirmation, the move itself, and what went wrong.
 * The last note (and a confirmed "no report") is kept so a handover refused with REPORT_NOT_SENT and then
 * UNPAID_BALANCE can be confirmed step by step without retyping anything.
 */
export function useJobMoves(jobId: number) {
  const transition = useTransitionJob(jobId);
  const [confirm, setConfirm] = useState<Move | null>(null);
  const [pending, setPending] = useState({ note: '', confirmNoReport: false });
  const move = (to: JobStatus, note = '', confirmNoReport = false, unpaidReason?: string) => {
    setPending({ note, confirmNoReport });
    transition.mutate({ to, note, confirmNoReport, ...(unpaidReason ? { unpaidReason } : {}) }, { onSuccess: () => setConfirm(null) });
  };
  const refused = (code: string) => transition.error instanceof ApiError && transition.error.code === code;
  return {
    confirm,
    setConfirm,
    move,
    handOverWithoutReport: () => move('collected', pending.note, true),
    handOverUnpaid: (reason: string) => move('collected', pending.note, pending.confirmNoReport, reason),
    pending: transition.isPending,
    noReport: refused('REPORT_NOT_SENT'),
    unpaid: refused('UNPAID_BALANCE'),
    error: moveError(transition.error),
    dismissError: () => transition.reset(),
  };
}
