import type { CreatePairRequest, ShotPairDto } from '@benchproof/contracts';
import { ActionIcon, Button, Collapse, Group, Paper, Stack, TextInput } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconArrowDown, IconArrowUp, IconCrop, IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useDeletePair, useUpdatePair } from '../api/pairs';
import { CompareView } from './compare-view';
import { CropEditor } from './crop-editor';

interface Props {
  pair: ShotPairDto;
  jobId: number;
  canEdit: boolean;
  onMove: (direction: -1 | 1) => void;
  /** After an unpair: what it takes to make the same pair again (the undo). */
  onUnpaired: (removed: CreatePairRequest) => void;
  isFirst: boolean;
  isLast: boolean;
}

/** The caption being typed, saved only when it differs from the stored one. */
function CaptionField({ saved, error, saving, onSave }: { saved: string; error?: string; saving: boolean; onSave: (caption: string) => void }) {
  const [caption, setCaption] = useState(saved);
  return (
    <Group align="flex-end" wrap="nowrap" gap="xs">
      <TextInput
        size="md"
        style={{ flex: 1 }}
        label="Caption"
        value={caption}
        onChange={(e) => setCaption(e.currentTarget.value)}
        error={error}
        maxLength={300}
      />
      <Button size="md" variant="light" disabled={caption === saved} loading={saving} onClick={() => onSave(caption)}>
        Save
      </Button>
    </Group>
  );
}

/** Move the pair up or down the order, open its crop, or unpair the two shots. */
function PairControls({
  pair,
  jobId,
  onMove,
  onUnpaired,
  isFirst,
  isLast,
  cropping,
  onToggleCrop,
}: Omit<Props, 'canEdit'> & { cropping: boolean; onToggleCrop: () => void }) {
  const remove = useDeletePair(jobId, pair.id);
  return (
    <Group justify="space-between">
      <Group gap={6}>
        <ActionIcon size={48} variant="light" aria-label="Move pair up" disabled={isFirst} onClick={() => onMove(-1)}>
          <IconArrowUp />
        </ActionIcon>
        <ActionIcon size={48} variant="light" aria-label="Move pair down" disabled={isLast} onClick={() => onMove(1)}>
          <IconArrowDown />
        </ActionIcon>
        <Button size="md" variant="light" leftSection={<IconCrop size={20} />} onClick={onToggleCrop} aria-expanded={cropping}>
          {pair.crop ? 'Change crop' : 'Crop both'}
        </Button>
      </Group>
      <ActionIcon
        size={48}
        variant="subtle"
        color="red"
        aria-label="Unpair these shots"
        loading={remove.isPending}
        onClick={() =>
          remove.mutate(undefined, {
            onSuccess: () => onUnpaired({ beforeAssetId: pair.before.id, afterAssetId: pair.after.id, caption: pair.caption, crop: pair.crop }),
          })
        }
      >
        <IconTrash />
      </ActionIcon>
    </Group>
  );
}

/** One pair: the comparison, its caption, its place in the order, its crop. */
export function PairCard({ pair, jobId, canEdit, onMove, onUnpaired, isFirst, isLast }: Props) {
  const update = useUpdatePair(jobId, pair.id);
  const [cropping, { toggle: toggleCrop, close: closeCrop }] = useDisclosure(false);
  const captionError = update.error instanceof ApiError ? (update.error.fieldErrors().caption ?? update.error.message) : undefined;
  return (
    <Paper withBorder radius="md" p="sm" data-testid="pair-card">
      <CompareView before={pair.before} after={pair.after} crop={pair.crop} caption={pair.caption} />
      {canEdit && (
        <Stack gap="xs" mt="sm">
          <CaptionField saved={pair.caption} error={captionError} saving={update.isPending} onSave={(caption) => update.mutate({ caption })} />
          <PairControls
            pair={pair}
            jobId={jobId}
            onMove={onMove}
            onUnpaired={onUnpaired}
            isFirst={isFirst}
            isLast={isLast}
            cropping={cropping}
            onToggleCrop={toggleCrop}
          />
          <Collapse expanded={cropping}>
            <CropEditor before={pair.before} value={pair.crop} saving={update.isPending} onSave={(crop) => update.mutate({ crop }, { onSuccess: closeCrop })} />
          </Collapse>
        </Stack>
      )}
    </Paper>
  );
}
