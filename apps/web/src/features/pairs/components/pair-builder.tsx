import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS, type MediaArea } from '@benchproof/domain';
import { Button, Select, Stack, TextInput } from '@mantine/core';
import { useState } from 'react';
import { ShotPicker } from './shot-picker';
import { usePairForm } from './use-pair-form';

/** Build a pair by hand: an area, then a before and an after shot of it, and a caption. */
export function PairBuilder({ jobId, shots, onDone }: { jobId: number; shots: MediaAssetDto[]; onDone: () => void }) {
  const areas = [...new Set(shots.filter((s) => s.phase === 'before').map((s) => s.area))].filter((a) =>
    shots.some((s) => s.area === a && s.phase === 'after'),
  );
  const [area, setArea] = useState<MediaArea | null>(areas[0] ?? null);
  const { beforeId, setBefore, afterId, setAfter, caption, setCaption, errors, submit, pending } = usePairForm(jobId, onDone);
  const inArea = (phase: 'before' | 'after') => shots.filter((s) => s.phase === phase && s.area === area);

  return (
    <Stack gap="sm" data-testid="pair-builder">
      <Select
        size="md"
        label="Area"
        data={areas.map((a) => ({ value: a, label: MEDIA_AREA_LABELS[a] }))}
        value={area}
        onChange={(v) => {
          setArea(v);
          setBefore(null);
          setAfter(null);
        }}
        allowDeselect={false}
        nothingFoundMessage="No area has both before and after shots yet"
      />
      <ShotPicker label="Before shots" shots={inArea('before')} value={beforeId} onChange={setBefore} error={errors.beforeAssetId} />
      <ShotPicker label="After shots" shots={inArea('after')} value={afterId} onChange={setAfter} error={errors.afterAssetId} />
      <TextInput
        size="md"
        label="Caption"
        placeholder="e.g. Chain: worn and replaced"
        value={caption}
        onChange={(e) => setCaption(e.currentTarget.value)}
        error={errors.caption}
        maxLength={300}
      />
      <Button size="lg" onClick={submit} loading={pending}>
        Make this pair
      </Button>
    </Stack>
  );
}
