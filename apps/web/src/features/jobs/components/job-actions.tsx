import type { JobDetail } from '@benchproof/contracts';
import { allowedTransitions, nextAction } from '@benchproof/domain';
import { Alert, Button, Group, Stack } from '@mantine/core';
import { IconAlertTriangle, IconArrowRight, IconDots } from '@tabler/icons-react';
import { lazy, Suspense, useState } from 'react';
import { useAfterFirstScreen } from '../../../lib/after-first-screen';
import { useJobMoves, type Move } from './use-job-moves';

const parts = () => import('./job-move-parts');
const OtherMovesMenu = lazy(async () => ({ default: (await import('./job-menu')).OtherMovesMenu }));
const ConfirmMove = lazy(async () => ({ default: (await parts()).ConfirmMove }));
const ConfirmNoReport = lazy(async () => ({ default: (await parts()).ConfirmNoReport }));
const ConfirmUnpaid = lazy(async () => ({ default: (await parts()).ConfirmUnpaid }));

/**
 * "More moves": the same button on the first screen; its menu's code loads a moment later or on the first tap, which
 * it then replays so the menu opens (not on hover or focus: swapping the button under a pressed pointer swallows the click).
 */
function MoreMoves({ moves, onPick }: { moves: Move[]; onPick: (move: Move) => void }) {
  const [ready, wake] = useAfterFirstScreen();
  const [tapped, setTapped] = useState(false);
  const still = (
    <Button size="lg" variant="default" leftSection={<IconDots />} style={{ flex: '1 0 auto' }} onClick={() => (setTapped(true), wake())}>
      More moves
    </Button>
  );
  if (!ready) return still;
  return (
    <Suspense fallback={still}>
      <OtherMovesMenu moves={moves} onPick={onPick} openAtOnce={tapped} />
    </Suspense>
  );
}

/** The next sensible move as one big button, the other allowed moves in a menu. */
export function JobActions({ job }: { job: JobDetail }) {
  const { confirm, setConfirm, move, handOverWithoutReport, handOverUnpaid, pending, noReport, unpaid, error, dismissError } = useJobMoves(job.id);
  const [ready] = useAfterFirstScreen();
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
        {others.length > 0 && <MoreMoves moves={others} onPick={setConfirm} />}
      </Group>
      {error && (
        <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert" withCloseButton onClose={dismissError}>
          {error}
        </Alert>
      )}
      {(ready || noReport || unpaid || confirm) && (
        <Suspense fallback={null}>
          <ConfirmNoReport opened={noReport} onClose={dismissError} onConfirm={handOverWithoutReport} pending={pending} />
          <ConfirmUnpaid opened={unpaid} onClose={dismissError} onConfirm={handOverUnpaid} pending={pending} />
          <ConfirmMove
            key={confirm?.to ?? 'none'}
            move={confirm}
            onClose={() => setConfirm(null)}
            onConfirm={(note) => confirm && move(confirm.to, note)}
            pending={pending}
          />
        </Suspense>
      )}
    </Stack>
  );
}
