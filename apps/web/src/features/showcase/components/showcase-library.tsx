import type { ShowcaseQuery } from '@benchproof/contracts';
import { Alert, SimpleGrid, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { useShowcaseItems } from '../api/showcase';
import { ShowcaseCard } from './showcase-card';
import { ShowcaseFilters } from './showcase-filters';
import { ZipBar, type CardChoice } from './zip-bar';

type Choice = Omit<CardChoice, 'pairId'>;
const DEFAULT_CHOICE: Choice = { variant: 'pair', size: 'square' };

/** Which pairs are picked for a zip, and each card's "What" and "Size" (its Export button and the zip use the same). */
function useSelection() {
  const [selected, setSelected] = useState<Set<number>>(new Set());
  const [choices, setChoices] = useState<Map<number, Choice>>(new Map());
  const toggle = (pairId: number, on: boolean) =>
    setSelected((s) => {
      const n = new Set(s);
      if (on) n.add(pairId);
      else n.delete(pairId);
      return n;
    });
  const choiceOf = (pairId: number) => choices.get(pairId) ?? DEFAULT_CHOICE;
  const choose = (pairId: number, c: Choice) => setChoices((m) => new Map(m).set(pairId, c));
  return { has: (pairId: number) => selected.has(pairId), toggle, choiceOf, choose };
}

/**
 * The library: only pairs whose owner consented (the server decides), with filters and a zip of
 * a selection. `canManage` (showcase.manage) adds favourites and captions; the desk, where the
 * shop allows it, browses and exports.
 */
export function ShowcaseLibrary({ canManage }: { canManage: boolean }) {
  const [query, setQuery] = useState<ShowcaseQuery>({});
  const selection = useSelection();
  const items = useShowcaseItems(query);
  const list = items.data ?? [];
  return (
    <Stack>
      <ShowcaseFilters query={query} onChange={(patch) => setQuery((q) => ({ ...q, ...patch }))} />
      {items.isError && <Alert color="red">{items.error.message}</Alert>}
      {items.isSuccess && list.length === 0 && (
        <Text c="dimmed">No consented pairs match. A pair appears here once the owner has agreed to marketing use on their page or at the counter.</Text>
      )}
      <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }}>
        {list.map((item) => (
          <ShowcaseCard
            key={item.pairId}
            item={item}
            canManage={canManage}
            choice={selection.choiceOf(item.pairId)}
            onChoice={(c) => selection.choose(item.pairId, c)}
            selected={selection.has(item.pairId)}
            onSelect={(on) => selection.toggle(item.pairId, on)}
          />
        ))}
      </SimpleGrid>
      <ZipBar choices={list.filter((i) => selection.has(i.pairId)).map((i) => ({ pairId: i.pairId, ...selection.choiceOf(i.pairId) }))} />
    </Stack>
  );
}
