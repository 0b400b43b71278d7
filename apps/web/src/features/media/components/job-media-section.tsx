import type { MediaListQuery } from '@benchproof/contracts';
import { Button, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconCamera, IconScan } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useMedia } from '../api/media';
import type { RenderStill } from '../viewer/media-stage';
import { MediaViewer } from '../viewer/media-viewer';
import { groupMedia, viewerOrder } from './grouping';
import { MediaBulkBar } from './media-bulk-bar';
import { MediaFilters } from './media-filters';
import { MediaGrid } from './media-grid';

function useSelection() {
  const [selected, setSelected] = useState<Set<number>>(new Set());
  const toggle = (id: number, on: boolean) =>
    setSelected((s) => {
      const next = new Set(s);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  return { selected, toggle, clear: () => setSelected(new Set()) };
}

function SectionHeader({ jobId, count }: { jobId: number; count: number }) {
  return (
    <Group justify="space-between" align="flex-end">
      <div>
        <Title order={3}>Media</Title>
        <Text size="sm" c="dimmed">
          {count === 1 ? '1 shot' : `${count} shots`}
        </Text>
      </div>
      <Group gap="sm">
        <Button component={Link} to={`/jobs/${jobId}/scope`} variant="light" size="lg" leftSection={<IconScan />}>
          Scope
        </Button>
        <Button component={Link} to={`/jobs/${jobId}/capture`} size="lg" leftSection={<IconCamera />}>
          Add shots
        </Button>
      </Group>
    </Group>
  );
}

/** The job's shots: add, filter, select for bulk re-tag or delete, and open full screen. */
export function JobMediaSection({ jobId, canSeeDeleted = false, renderStill }: { jobId: number; canSeeDeleted?: boolean; renderStill?: RenderStill }) {
  const [filters, setFilters] = useState<MediaListQuery>({});
  const media = useMedia(jobId, filters);
  const { selected, toggle, clear } = useSelection();
  const [viewing, setViewing] = useState<number | null>(null);
  const groups = groupMedia(media.data ?? []);
  const ordered = viewerOrder(groups);
  const ids = ordered.filter((a) => selected.has(a.id)).map((a) => a.id);

  return (
    <Paper withBorder radius="md" p="md" component="section" aria-label="Media">
      <Stack gap="md">
        <SectionHeader jobId={jobId} count={ordered.length} />
        <MediaFilters value={filters} onChange={setFilters} canSeeDeleted={canSeeDeleted} />
        {ids.length > 0 && <MediaBulkBar jobId={jobId} ids={ids} onDone={clear} />}
        <QueryState isLoading={media.isLoading} error={media.error} />
        {media.data && !ordered.length && <Text c="dimmed">No shots match. Use “Add shots” to take some.</Text>}
        <MediaGrid groups={groups} selected={selected} onSelect={toggle} onOpen={(a) => setViewing(ordered.indexOf(a))} />
      </Stack>
      <MediaViewer jobId={jobId} assets={ordered} index={viewing} onIndex={setViewing} renderStill={renderStill} />
    </Paper>
  );
}
