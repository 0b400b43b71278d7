import { Alert, Button, Collapse, Group, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus } from '@tabler/icons-react';
import { formFailure } from '../../../lib/form';
import { PairBuilder } from './pair-builder';
import { SuggestionList } from './suggestion-list';
import type { SuggestedPairsState } from './use-suggested-pairs';

/** For staff who edit: the one-tap suggestions, and the builder for pairing shots by hand. */
export function SuggestedPairs({ jobId, state }: { jobId: number; state: SuggestedPairsState }) {
  const { suggestions, shots, pickError, busyKey, pick } = state;
  const [building, { toggle, close }] = useDisclosure(false);
  return (
    <Stack gap="sm">
      <Title order={3}>Suggested pairs</Title>
      <Text size="sm" c="dimmed">
        From the area tags, Before/After phases, when each shot was taken, and how alike the framing is. Check each before you pair it: a hint, not a verdict.
      </Text>
      {pickError && <Alert color="red">{formFailure(pickError)}</Alert>}
      {(suggestions?.pendingHashes ?? 0) > 0 && <Text size="sm">Comparing framing of {suggestions?.pendingHashes} new shot(s)…</Text>}
      {suggestions && <SuggestionList suggestions={suggestions.suggestions} onPick={pick} busyKey={busyKey} />}
      <Group>
        <Button size="lg" variant="light" leftSection={<IconPlus />} onClick={toggle} aria-expanded={building}>
          Pair shots by hand
        </Button>
      </Group>
      <Collapse expanded={building}>{shots && <PairBuilder jobId={jobId} shots={shots} onDone={close} />}</Collapse>
    </Stack>
  );
}
