import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS, type MediaArea } from '@benchproof/domain';
import { Button, Select, Stack, TextInput } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useCreatePair } from '../api/pairs';
import { ShotPicker } from './shot-picker';

/** Build a pair by hand: an area, then a before and an after shot of it, and a caption. */
export function PairBuilder({ jobId, shots, onDone }: { jobId: number; shots: MediaAssetDto[]; onDone: () => void }) {
  const areas = [...new Set(shots.filter((s) => s.phase === 'before').map((s) => s.area))].filter((a) => shots.some((s) => s.area === a && s.phase === 'after'));
  const [area, setArea] = useState<MediaArea | null>(areas[0] ?? null);
  const [beforeId, setBefore] = useState<number | null>(null);
  const [afterId, setAfter] = useState<number | null>(null);
  const [caption, setCaption] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreatePair(jobId);
  const inArea = (phase: 'before' | 'after') => shots.filter((s) => s.phase === phase && s.area === area);

  const submit = () => {
    const missing: Record<string, string> = {};
    if (!beforeId) missing.beforeAssetId = 'Tap a before shot.';
    if (!afterId) missing.afterAssetId = 'Tap an after shot.';
    setErrors(missing);
    if (!beforeId || !afterId) return;
    create.mutate(
      { beforeAssetId: beforeId, afterAssetId: afterId, caption },
      {
        onSuccess: () => {
          setBefore(null);
          setAfter(null);
          setCaption('');
          onDone();
        },
        // Server refusals (wrong phase, other job, already a pair) go under the field they concern.
        onError: (e) => setErrors(e instanceof ApiError ? { afterAssetId: e.message, ...e.fieldErrors() } : { afterAssetId: 'Could not save the pair.' }),
      },
    );
  };

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
      <TextInput size="md" label="Caption" placeholder="e.g. Chain: worn and replaced" value={caption} onChange={(e) => setCaption(e.currentTarget.value)} error={errors.caption} maxLength={300} />
      <Button size="lg" onClick={submit} loading={create.isPending}>
        Make this pair
      </Button>
    </Stack>
  );
}
