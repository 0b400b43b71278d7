import type { JobDetail } from '@benchproof/contracts';
import { allowedTransitions, JOB_STATUS_LABELS, nextAction } from '@benchproof/domain';
import { Alert, Button, Group, Menu, Modal, Stack, Text, Textarea } from '@mantine/core';
import { IconAlertTriangle, IconArrowRight, IconDots } from '@tabler/icons-react';
import { useState } from 'react';
import { useJobMoves, type Move } from './use-job-moves';

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

/** The allowed moves other than the next one, each asking for confirmation first. */
function OtherMovesMenu({ moves, onPick }: { moves: Move[]; onPick: (move: Move) => void }) {
  return (
    <Menu position="bottom-end" withinPortal>
      <Menu.Target>
        <Button size="lg" variant="default" aria-label="Other moves" leftSection={<IconDots />} style={{ flex: '1 0 auto' }}>
          More moves
        </Button>
      </Menu.Target>
      <Menu.Dropdown>
        {moves.map((t) => (
          <Menu.Item key={t.to} color={t.to === 'cancelled' ? 'red' : undefined} onClick={() => onPick(t)} style={{ minHeight: 44 }}>
            {t.label}
          </Menu.Item>
        ))}
      </Menu.Dropdown>
    </Menu>
  );
}

/** The next sensible move as one big button, the other allowed moves in a menu. */
export function JobActions({ job }: { job: JobDetail }) {
  const { confirm, setConfirm, move, handOverWithoutReport, pending, noReport, error, dismissError } = useJobMoves(job.id);
  const primary = job.nextAction ?? nextAction(job.status);
  const others: Move[] = (job.allowedTransitions.length ? job.allowedTransitions : allowedTransitions(job.status)).filter((t) => t.to !== primary?.to);
  return (
    <Stack gap="xs">
      <Group gap="xs" wrap="wrap">
        {primary && (
          <Button size="lg" rightSection={<IconArrowRight />} loading={pending && !confirm} onClick={() => move(primary.to)} style={{ flex: '1 1 240px' }}>
            {primary.label}
          </Button>
        )}
        {others.length > 0 && <OtherMovesMenu moves={others} onPick={setConfirm} />}
      </Group>
      {error && (
        <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert" withCloseButton onClose={dismissError}>
          {error}
        </Alert>
      )}
      <ConfirmNoReport opened={noReport} onClose={dismissError} onConfirm={handOverWithoutReport} pending={pending} />
      <ConfirmMove
        key={confirm?.to ?? 'none'}
        move={confirm}
        onClose={() => setConfirm(null)}
        onConfirm={(note) => confirm && move(confirm.to, note)}
        pending={pending}
      />
    </Stack>
  );
}
