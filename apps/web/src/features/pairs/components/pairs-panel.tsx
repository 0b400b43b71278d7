import type { PairSuggestionDto, ShotPairDto } from '@benchproof/contracts';
import { Alert, Button, Collapse, Group, Loader, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { formFailure } from '../../../lib/form';
import { useCreatePair, usePairableShots, usePairs, usePairSuggestions, useReorderPairs } from '../api/pairs';
import { PairBuilder } from './pair-builder';
import { PairCard } from './pair-card';
import { SuggestionList } from './suggestion-list';

const swap = (ids: number[], i: number, j: number) => {
  const next = [...ids];
  [next[i], next[j]] = [next[j], next[i]];
  return next;
};

/** The job page's Pairs section: the pairs in their order, one-tap suggestions, and a builder. */
export function PairsPanel({ jobId, canEdit }: { jobId: number; canEdit: boolean }) {
  const pairs = usePairs(jobId);
  const suggestions = usePairSuggestions(jobId);
  const shots = usePairableShots(jobId);
  const create = useCreatePair(jobId);
  const reorder = useReorderPairs(jobId);
  const [building, { toggle, close }] = useDisclosure(false);
  const [busyKey, setBusyKey] = useState<string | null>(null);

  const pick = (s: PairSuggestionDto) => {
    setBusyKey(`${s.before.id}-${s.after.id}`);
    create.mutate({ beforeAssetId: s.before.id, afterAssetId: s.after.id, caption: s.after.caption }, { onSettled: () => setBusyKey(null) });
  };
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
        {list.length === 0 && <Text c="dimmed">No pairs yet. Take after shots of the parts you worked on, then pair them below.</Text>}
        {list.map((p, i) => (
          <PairCard key={p.id} pair={p} jobId={jobId} canEdit={canEdit} onMove={(d) => move(list, i, d)} isFirst={i === 0} isLast={i === list.length - 1} />
        ))}
      </Stack>
      {canEdit && (
        <Stack gap="sm">
          <Title order={3}>Suggested pairs</Title>
          <Text size="sm" c="dimmed">
            From the area tags, Before/After phases, when each shot was taken, and how alike the framing is. Check each before you pair it: a hint, not a
            verdict.
          </Text>
          {create.error && <Alert color="red">{formFailure(create.error)}</Alert>}
          {(suggestions.data?.pendingHashes ?? 0) > 0 && <Text size="sm">Comparing framing of {suggestions.data?.pendingHashes} new shot(s)…</Text>}
          {suggestions.data && <SuggestionList suggestions={suggestions.data.suggestions} onPick={pick} busyKey={busyKey} />}
          <Group>
            <Button size="lg" variant="light" leftSection={<IconPlus />} onClick={toggle} aria-expanded={building}>
              Pair shots by hand
            </Button>
          </Group>
          <Collapse expanded={building}>{shots.data && <PairBuilder jobId={jobId} shots={shots.data} onDone={close} />}</Collapse>
        </Stack>
      )}
    </Stack>
  );
}
