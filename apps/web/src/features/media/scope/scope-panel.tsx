import type { MediaAssetDto } from '@benchproof/contracts';
import { Stack, Tabs, Title } from '@mantine/core';
import { IconDeviceCctv, IconMovie } from '@tabler/icons-react';
import { useState } from 'react';
import { useMedia } from '../api/media';
import { LiveScope } from './live-scope';
import { StillsStrip } from './stills-strip';
import { VideoGrab } from './video-grab';
import type { VideoSource } from './video-source';

const asSource = (a: MediaAssetDto | undefined): VideoSource | null =>
  a ? { kind: 'asset', assetId: a.id, src: a.urls.original, name: `video ${a.id}` } : null;

/** Scope capture: live from a camera or borescope, or frame by frame from a recorded video. */
export function ScopePanel({ jobId, videoId }: { jobId: number; videoId: number | null }) {
  const [tab, setTab] = useState<string | null>(videoId ? 'video' : 'live');
  const { data, isLoading } = useMedia(jobId);
  const initial = asSource(data?.find((a) => a.id === videoId));
  return (
    <Stack gap="md">
      <Tabs value={tab} onChange={setTab} keepMounted={false}>
        <Tabs.List grow>
          <Tabs.Tab value="live" leftSection={<IconDeviceCctv size={20} />} fz="md" py="md">
            Live
          </Tabs.Tab>
          <Tabs.Tab value="video" leftSection={<IconMovie size={20} />} fz="md" py="md">
            From a video
          </Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="live" pt="md">
          <LiveScope jobId={jobId} />
        </Tabs.Panel>
        <Tabs.Panel value="video" pt="md">
          {!(videoId && isLoading) && <VideoGrab key={initial?.src ?? 'none'} jobId={jobId} initial={initial} />}
        </Tabs.Panel>
      </Tabs>
      <Title order={4}>Grabbed stills</Title>
      <StillsStrip jobId={jobId} />
    </Stack>
  );
}
