import type { OwnerFinding } from '@benchproof/contracts';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useOwnerDecisions } from '../api/owner-page';
import type { Choice } from './use-choices';

interface Options {
  token: string;
  chosen: OwnerFinding[];
  choices: Record<number, Choice>;
  onDone: () => void;
  onPriceChanged: () => void;
}

/**
 * The owner's answers as sent to the shop, with the version and price they saw (so a changed
 * price is refused), and the extra tick each declined safety item needs before sending.
 */
export function useSendDecisions({ token, chosen, choices, onDone, onPriceChanged }: Options) {
  const send = useOwnerDecisions(token);
  const [safetyOk, setSafetyOk] = useState<Record<number, boolean>>({});
  const declinedSafety = chosen.filter((f) => f.recommendation?.urgency === 'safety' && choices[f.recommendation.id] === 'declined');
  const ready = declinedSafety.every((f) => safetyOk[f.id]);

  const submit = () => {
    const items = chosen.flatMap((f) => {
      const rec = f.recommendation;
      if (!rec) return [];
      const status = choices[rec.id];
      return [
        {
          recommendationId: rec.id,
          status,
          seenUpdatedAt: rec.updatedAt,
          seenGrossMinor: rec.totals.grossMinor,
          safetyConfirmed: status === 'declined' && Boolean(safetyOk[f.id]),
        },
      ];
    });
    send.mutate(
      { items },
      {
        onSuccess: onDone,
        onError: (e) => {
          // The shop re-priced, or the job closed meanwhile: show the page as it is now.
          if ((e as ApiError).code === 'PRICE_CHANGED' || (e as ApiError).code === 'JOB_CLOSED') onPriceChanged();
        },
      },
    );
  };

  return {
    submit,
    sending: send.isPending,
    error: send.error as ApiError | null,
    declinedSafety,
    ready,
    safetyOk,
    confirmSafety: (findingId: number, ok: boolean) => setSafetyOk((p) => ({ ...p, [findingId]: ok })),
  };
}
