import { MEDIA_AREAS, MEDIA_AREA_LABELS } from '@benchproof/domain';
import type { ShowcaseQuery, ShowcaseSize } from '@benchproof/contracts';
import { Alert, Button, Group, Select, SimpleGrid, Stack, Switch, Text, TextInput } from '@mantine/core';
import { IconFileZip } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { downloadZip, useShowcaseItems } from '../api/showcase';
import { ShowcaseCard } from './showcase-card';

const AREA_OPTIONS = MEDIA_AREAS.map((a) => ({ value: a, label: MEDIA_AREA_LABELS[a] }));

/** The library: only pairs whose owner consented (the server decides), with filters and a zip of a selection. */
export function ShowcaseLibrary() {
  const [query, setQuery] = useState<ShowcaseQuery>({});
  const [selected, setSelected] = useState<Set<number>>(new Set());
  const [zipSize, setZipSize] = useState<ShowcaseSize>('square');
  const [zipping, setZipping] = useState(false);
  const [zipError, setZipError] = useState<string | null>(null);
  const items = useShowcaseItems(query);
  const list = items.data ?? [];
  const chosen = list.filter((i) => selected.has(i.pairId));
  const set = (patch: Partial<ShowcaseQuery>) => setQuery((q) => ({ ...q, ...patch }));
  const zip = async () => {
    setZipping(true);
    setZipError(null);
    try {
      await downloadZip({ items: chosen.map((i) => ({ pairId: i.pairId, variant: 'pair', size: zipSize })) });
    } catch (e) {
      setZipError(e instanceof ApiError ? e.message : 'The zip failed.');
    } finally {
      setZipping(false);
    }
  };
  return (
    <Stack>
      <SimpleGrid cols={{ base: 1, sm: 3 }}>
        <Select
          size="md"
          label="Area"
          placeholder="All areas"
          clearable
          data={AREA_OPTIONS}
          value={query.area ?? null}
          onChange={(v) => set({ area: v ?? undefined })}
        />
        <TextInput size="md" type="date" label="From" value={query.from ?? ''} onChange={(e) => set({ from: e.currentTarget.value || undefined })} />
        <TextInput size="md" type="date" label="To" value={query.to ?? ''} onChange={(e) => set({ to: e.currentTarget.value || undefined })} />
      </SimpleGrid>
      <Switch
        size="lg"
        label="Favourites only"
        checked={query.favourites === 'true'}
        onChange={(e) => set({ favourites: e.currentTarget.checked ? 'true' : undefined })}
      />
      {items.isError && <Alert color="red">{items.error.message}</Alert>}
      {items.isSuccess && list.length === 0 && (
        <Text c="dimmed">No consented pairs match. A pair appears here once the owner has agreed to marketing use on their page or at the counter.</Text>
      )}
      <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }}>
        {list.map((item) => (
          <ShowcaseCard
            key={item.pairId}
            item={item}
            selected={selected.has(item.pairId)}
            onSelect={(on) =>
              setSelected((s) => {
                const n = new Set(s);
                if (on) n.add(item.pairId);
                else n.delete(item.pairId);
                return n;
              })
            }
          />
        ))}
      </SimpleGrid>
      {chosen.length > 0 && (
        <Group justify="flex-end" align="flex-end" style={{ position: 'sticky', bottom: 0, background: 'var(--mantine-color-body)', padding: 8 }}>
          <Select
            size="md"
            label="Zip size"
            w={240}
            data={[
              { value: 'square', label: 'Square 1080×1080' },
              { value: 'portrait', label: 'Portrait 1080×1350' },
              { value: 'banner', label: 'Banner 1600×600' },
            ]}
            value={zipSize}
            onChange={(v) => v && setZipSize(v)}
            allowDeselect={false}
          />
          <Button size="md" leftSection={<IconFileZip size={20} />} loading={zipping} onClick={() => void zip()}>
            Zip {chosen.length} selected
          </Button>
        </Group>
      )}
      {zipError && (
        <Text c="red" role="alert">
          {zipError}
        </Text>
      )}
    </Stack>
  );
}
