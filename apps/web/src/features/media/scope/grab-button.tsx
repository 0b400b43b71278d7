import { Button } from '@mantine/core';
import { IconCapture } from '@tabler/icons-react';

/** One big tap to grab the frame on screen. */
export function GrabButton({ onGrab, disabled }: { onGrab: () => void; disabled?: boolean }) {
  return (
    <Button
      size="xl"
      h={80}
      fullWidth
      color="brass.7"
      leftSection={<IconCapture size={34} />}
      onClick={onGrab}
      disabled={disabled}
      styles={{ label: { fontSize: 20 } }}
    >
      Grab still
    </Button>
  );
}
