import { JOB_STATUS_LABELS } from '@benchproof/domain';
import { Button, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import type { Move } from './use-job-moves';

/* The job's move dialogs: their own chunk (Modal and their focus trap and positioning code), loaded after the first screen. */

export function ConfirmMove({
  move,
  onClose,
  onConfirm,
  pending,
}: {
  move: Move | null;
  onClose: () => void;
  onConfirm: (note: string) => void;
  pending: boolean;
}) {
  const [note, setNote] = useState('');
  return (
    <Modal opened={move !== null} onClose={onClose} title={move?.label ?? ''}>
      <Stack>
        <Text>
          The job moves to <b>{move ? JOB_STATUS_LABELS[move.to] : ''}</b>.
        </Text>
        <Textarea
          label="Note (optional)"
          placeholder="Why — shown in the job's history"
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
          autosize
          minRows={2}
        />
        <Button size="lg" color={move?.to === 'cancelled' ? 'red' : undefined} loading={pending} onClick={() => onConfirm(note)}>
          {move?.label}
        </Button>
      </Stack>
    </Modal>
  );
}

/** Handing over with no report sent: desk confirms, and the job records that the bike left without one. */
export function ConfirmNoReport({ opened, onClose, onConfirm, pending }: { opened: boolean; onClose: () => void; onConfirm: () => void; pending: boolean }) {
  return (
    <Modal opened={opened} onClose={onClose} title="No report sent yet">
      <Stack>
        <Text>No bench report has been e-mailed to the owner for this job. If the bike leaves now, the job records that it was handed over without one.</Text>
        <Button size="lg" color="orange" loading={pending} onClick={onConfirm}>
          Hand over without a report
        </Button>
        <Button size="lg" variant="default" onClick={onClose}>
          Not yet — send the report first
        </Button>
      </Stack>
    </Modal>
  );
}
