import { MEDIA_AREA_LABELS, MEDIA_AREAS, MEDIA_PHASE_LABELS, MEDIA_PHASES, type MediaArea, type MediaPhase } from '@benchproof/domain';
import { Alert, Button, Group, Paper, Select, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { useDeleteMedia, useRetagMedia } from '../api/media';
import { ConfirmDelete } from './confirm-delete';

/** The phase and area to set on every selected shot; empty keeps each shot's own. */
function RetagPickers({
  phase,
  area,
  onPhase,
  onArea,
}: {
  phase: MediaPhase | null;
  area: MediaArea | null;
  onPhase: (p: MediaPhase | null) => void;
  onArea: (a: MediaArea | null) => void;
}) {
  return (
    <>
      <Select
        label="Set phase"
        placeholder="Keep"
        clearable
        w={140}
        data={MEDIA_PHASES.map((p) => ({ value: p, label: MEDIA_PHASE_LABELS[p] }))}
        value={phase}
        onChange={(v) => onPhase(v)}
      />
      <Select
        label="Set area"
        placeholder="Keep"
        clearable
        w={200}
        data={MEDIA_AREAS.map((a) => ({ value: a, label: MEDIA_AREA_LABELS[a] }))}
        value={area}
        onChange={(v) => onArea(v)}
      />
    </>
  );
}

/** Re-tag or delete the selected shots in one go. */
export function MediaBulkBar({ jobId, ids, onDone }: { jobId: number; ids: number[]; onDone: () => void }) {
  const [phase, setPhase] = useState<MediaPhase | null>(null);
  const [area, setArea] = useState<MediaArea | null>(null);
  const [confirming, confirm] = useDisclosure(false);
  const retag = useRetagMedia(jobId);
  const remove = useDeleteMedia(jobId);
  const apply = () => retag.mutate({ ids, phase: phase ?? undefined, area: area ?? undefined }, { onSuccess: onDone });
  const removeAll = () =>
    remove.mutate(ids, {
      onSettled: () => {
        confirm.close();
        onDone();
      },
    });
  const error = retag.error ?? remove.error;
  return (
    <Paper withBorder p="sm" radius="md" bg="bench.0">
      <Group gap="sm" align="flex-end">
        <Text fw={700} mb={8}>{`${ids.length} selected`}</Text>
        <RetagPickers phase={phase} area={area} onPhase={setPhase} onArea={setArea} />
        <Button onClick={apply} disabled={!phase && !area} loading={retag.isPending}>
          Re-tag
        </Button>
        <Button color="red" variant="light" onClick={confirm.open}>
          Delete
        </Button>
        <Button variant="subtle" color="gray" onClick={onDone}>
          Clear selection
        </Button>
      </Group>
      {error && (
        <Alert color="red" mt="sm" role="alert">
          {error.message}
        </Alert>
      )}
      <ConfirmDelete count={ids.length} opened={confirming} onClose={confirm.close} busy={remove.isPending} onConfirm={removeAll} />
    </Paper>
  );
}
