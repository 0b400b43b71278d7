import type { CreatePairRequest, ShotPairDto } from '@benchproof/contracts';
import { Alert, Loader, Stack, Text, Title } from '@mantine/core';
import { useState } from 'react';
import { usePairs, useReorderPairs } from '../api/pairs';
import { PairCard } from './pair-card';
import { SuggestedPairs } from './suggested-pairs';
import { UnpairedNotice } from './unpaired-notice';
import { useSuggestedPairs } from './use-suggested-pairs';

const swap = (ids: number[], i: number, j: number) => {
  const next = [...ids];
  [next[i], next[j]] = [next[j], next[i]];
  return next;
};

/** The job page's Pairs section: the pairs in their order, one-tap suggestions, and a builder. */
export function PairsPanel({ jobId, canEdit }: { jobId: number; canEdit: boolean }) {
  const pairs = usePairs(jobId);
  const suggested = useSuggestedPairs(jobId);
  const reorder = useReorderPairs(jobId);
  const [removed, setRemoved] = useState<CreatePairRequest | null>(null);
  const move = (list: ShotPairDto[], i: number, dir: -1 | 1) =>
    reorder.mutate({
      ids: swap(
        list.map((p) => p.id),
        i,
        i + dir,
      ),
    });

  if (pairs.isPending) return <Loader />;
  if (pairs.isError) return <Alert color="red">{pairs.error.message}</Alert>;
  const list = pairs.data;
  return (
    <Stack gap="lg">
      <Stack gap="sm">
        <Title order={3}>Pairs ({list.length})</Title>
        {removed && <UnpairedNotice jobId={jobId} removed={removed} onDone={() => setRemoved(null)} />}
        {list.length === 0 && <Text c="dimmed">No pairs yet. Take after shots of the parts you worked on, then pair them below.</Text>}
        {list.map((p, i) => (
          <PairCard
            key={p.id}
            pair={p}
            jobId={jobId}
            canEdit={canEdit}
            onMove={(d) => move(list, i, d)}
            onUnpaired={setRemoved}
            isFirst={i === 0}
            isLast={i === list.length - 1}
          />
        ))}
      </Stack>
      {canEdit && <SuggestedPairs jobId={jobId} state={suggested} />}
    </Stack>
  );
}
