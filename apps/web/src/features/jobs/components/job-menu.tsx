import { Button, Menu } from '@mantine/core';
import { IconDots } from '@tabler/icons-react';
import { useClickOnArrival } from '../../../lib/after-first-screen';
import type { Move } from './use-job-moves';

/** The allowed moves other than the next one, each asking for confirmation first (its own chunk: Menu brings the popover and its positioning code). */
export function OtherMovesMenu({ moves, onPick, openAtOnce = false }: { moves: Move[]; onPick: (move: Move) => void; openAtOnce?: boolean }) {
  const target = useClickOnArrival<HTMLButtonElement>(openAtOnce);
  return (
    <Menu position="bottom-end" withinPortal>
      <Menu.Target>
        <Button ref={target} size="lg" variant="default" leftSection={<IconDots />} style={{ flex: '1 0 auto' }}>
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
