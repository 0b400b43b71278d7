import { MEDIA_AREA_LABELS, MEDIA_PHASE_LABELS, isVideoKind } from '@benchproof/domain';
import { Button, FileButton, Group, Select } from '@mantine/core';
import { IconFileUpload } from '@tabler/icons-react';
import { useMedia } from '../api/media';

/** Where the frames come from: a video already stored with the job, or a file on this device. */
export type VideoSource = { kind: 'asset'; assetId: number; src: string; name: string } | { kind: 'local'; file: File; src: string; name: string };

export function VideoSourcePicker({ jobId, value, onChange }: { jobId: number; value: VideoSource | null; onChange: (v: VideoSource) => void }) {
  const { data } = useMedia(jobId);
  const videos = (data ?? []).filter((a) => isVideoKind(a.kind));
  const options = videos.map((v) => ({
    value: String(v.id),
    label: `Video ${v.id} · ${MEDIA_PHASE_LABELS[v.phase]} · ${MEDIA_AREA_LABELS[v.area]}${v.caption ? ` · ${v.caption}` : ''}`,
  }));
  const pickAsset = (id: string | null) => {
    const v = videos.find((a) => String(a.id) === id);
    if (v) onChange({ kind: 'asset', assetId: v.id, src: v.urls.original, name: `video ${v.id}` });
  };
  return (
    <Group gap="sm" align="flex-end">
      <Select
        label="Stored video of this job"
        placeholder={options.length ? 'Pick a video' : 'No videos stored yet'}
        data={options}
        value={value?.kind === 'asset' ? String(value.assetId) : null}
        onChange={pickAsset}
        style={{ flex: 1, minWidth: 220 }}
      />
      <FileButton accept="video/*" onChange={(f) => f && onChange({ kind: 'local', file: f, src: URL.createObjectURL(f), name: f.name })}>
        {(props) => (
          <Button {...props} variant="default" size="md" leftSection={<IconFileUpload size={18} />}>
            Video on this device
          </Button>
        )}
      </FileButton>
    </Group>
  );
}
