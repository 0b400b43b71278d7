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

/** Handing over with money still due: desk says why (required); the reason goes into the job's history and audit. */
export function ConfirmUnpaid({
  opened,
  onClose,
  onConfirm,
  pending,
}: {
  opened: boolean;
  onClose: () => void;
  onConfirm: (reason: string) => void;
  pending: boolean;
}) {
  const [reason, setReason] = useState('');
  const [tried, setTried] = useState(false);
  const missing = tried && !reason.trim() ? 'Say why the bike goes home unpaid.' : null;
  return (
    <Modal opened={opened} onClose={onClose} title="Money still due">
      <Stack>
        <Text>This job still has money due. The bike can go home unpaid; the reason is kept in the job&apos;s history.</Text>
        <Textarea
          label="Why is it going home unpaid?"
          placeholder="e.g. pays by bank transfer on Friday"
          value={reason}
          onChange={(e) => setReason(e.currentTarget.value)}
          error={missing}
          maxLength={500}
          rows={3}
          data-autofocus
        />
        <Button size="lg" color="orange" loading={pending} onClick={() => (reason.trim() ? onConfirm(reason.trim()) : setTried(true))}>
          Hand over unpaid
        </Button>
        <Button size="lg" variant="default" onClick={onClose}>
          Not yet — take the payment first
        </Button>
      </Stack>
    </Modal>
  );
}
