import type { JobDetail } from '@benchproof/contracts';
import { allowedTransitions, JOB_STATUS_LABELS, nextAction, type JobStatus } from '@benchproof/domain';
import { Alert, Button, Group, Menu, Modal, Stack, Text, Textarea } from '@mantine/core';
import { IconAlertTriangle, IconArrowRight, IconDots } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useTransitionJob } from '../api/jobs';

interface Move {
  to: JobStatus;
  label: string;
}

function ConfirmMove({ move, onClose, onConfirm, pending }: { move: Move | null; onClose: () => void; onConfirm: (note: string) => void; pending: boolean }) {
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
function ConfirmNoReport({ opened, onClose, onConfirm, pending }: { opened: boolean; onClose: () => void; onConfirm: () => void; pending: boolean }) {
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

/** The next sensible move as one big button, the other allowed moves in a menu. */
export function JobActions({ job }: { job: JobDetail }) {
  const transition = useTransitionJob(job.id);
  const [confirm, setConfirm] = useState<Move | null>(null);
  const primary = job.nextAction ?? nextAction(job.status);
  const others: Move[] = (job.allowedTransitions.length ? job.allowedTransitions : allowedTransitions(job.status)).filter((t) => t.to !== primary?.to);
  const [pendingNote, setPendingNote] = useState('');
  const move = (to: JobStatus, note = '', confirmNoReport = false) => {
    setPendingNote(note);
    transition.mutate({ to, note, confirmNoReport }, { onSuccess: () => setConfirm(null) });
  };
  const noReport = transition.error instanceof ApiError && transition.error.code === 'REPORT_NOT_SENT';
  const error = noReport
    ? null
    : transition.error instanceof ApiError
      ? transition.error.message
      : transition.error
        ? 'The move did not go through. Try again.'
        : null;
  return (
    <Stack gap="xs">
      <Group gap="xs" wrap="wrap">
        {primary && (
          <Button
            size="lg"
            rightSection={<IconArrowRight />}
            loading={transition.isPending && !confirm}
            onClick={() => move(primary.to)}
            style={{ flex: '1 1 240px' }}
          >
            {primary.label}
          </Button>
        )}
        {others.length > 0 && (
          <Menu position="bottom-end" withinPortal>
            <Menu.Target>
              <Button size="lg" variant="default" aria-label="Other moves" leftSection={<IconDots />} style={{ flex: '1 0 auto' }}>
                More moves
              </Button>
            </Menu.Target>
            <Menu.Dropdown>
              {others.map((t) => (
                <Menu.Item key={t.to} color={t.to === 'cancelled' ? 'red' : undefined} onClick={() => setConfirm(t)} style={{ minHeight: 44 }}>
                  {t.label}
                </Menu.Item>
              ))}
            </Menu.Dropdown>
          </Menu>
        )}
      </Group>
      {error && (
        <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert" withCloseButton onClose={() => transition.reset()}>
          {error}
        </Alert>
      )}
      <ConfirmNoReport
        opened={noReport}
        onClose={() => transition.reset()}
        onConfirm={() => move('collected', pendingNote, true)}
        pending={transition.isPending}
      />
      <ConfirmMove
        key={confirm?.to ?? 'none'}
        move={confirm}
        onClose={() => setConfirm(null)}
        onConfirm={(note) => confirm && move(confirm.to, note)}
        pending={transition.isPending}
      />
    </Stack>
  );
}
