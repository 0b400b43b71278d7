import { ActionIcon, Group, Text, Tooltip } from '@mantine/core';
import { IconChevronLeft, IconChevronRight, IconChevronsLeft, IconChevronsRight, IconPlayerPauseFilled, IconPlayerPlayFilled } from '@tabler/icons-react';
import { FRAME_S, stepVideo, togglePlay } from './grab';

const fmt = (s: number) => `${Math.floor(s / 60)}:${(s % 60).toFixed(3).padStart(6, '0')}`;

interface Props {
  video: HTMLVideoElement | null;
  time: number;
  playing: boolean;
}

function Step({ label, onClick, children }: { label: string; onClick: () => void; children: React.ReactNode }) {
  return (
    <Tooltip label={label}>
      <ActionIcon size={52} variant="light" aria-label={label} onClick={onClick}>
        {children}
      </ActionIcon>
    </Tooltip>
  );
}

/** Play/pause and steps of one frame (~1/30 s) or one second either way. */
export function FrameStepper({ video, time, playing }: Props) {
  const step = (delta: number) => video && stepVideo(video, delta);
  const toggle = () => video && togglePlay(video);
  return (
    <Group justify="center" gap={6} wrap="nowrap">
      <Step label="Back 1 second" onClick={() => step(-1)}>
        <IconChevronsLeft />
      </Step>
      <Step label="Back 1 frame" onClick={() => step(-FRAME_S)}>
        <IconChevronLeft />
      </Step>
      <ActionIcon size={60} radius="xl" aria-label={playing ? 'Pause' : 'Play'} onClick={toggle}>
        {playing ? <IconPlayerPauseFilled /> : <IconPlayerPlayFilled />}
      </ActionIcon>
      <Step label="Forward 1 frame" onClick={() => step(FRAME_S)}>
        <IconChevronRight />
      </Step>
      <Step label="Forward 1 second" onClick={() => step(1)}>
        <IconChevronsRight />
      </Step>
      <Text ff="monospace" size="sm" w={86} ta="right" data-testid="video-time">
        {fmt(time)}
      </Text>
    </Group>
  );
}
