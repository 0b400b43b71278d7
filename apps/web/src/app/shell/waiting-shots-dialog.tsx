import { Button, Modal, Stack, Text } from '@mantine/core';

/** Asked at sign-out while shots still wait on this phone: keep them for this user's next sign-in, or delete them. */
export function WaitingShotsDialog({ waiting, onChoose, onClose }: { waiting: number; onChoose: (keep: boolean) => void; onClose: () => void }) {
  return (
    <Modal opened onClose={onClose} title="Shots still waiting" centered>
      <Stack gap="md">
        <Text>
          {waiting === 1 ? '1 shot has' : `${waiting} shots have`} not reached the workshop server yet. Keep them on this phone to send after your next sign-in,
          or delete them?
        </Text>
        <Button size="lg" onClick={() => onChoose(true)}>
          Keep for my next sign-in
        </Button>
        <Button size="lg" color="red" variant="light" onClick={() => onChoose(false)}>
          Delete the waiting shots
        </Button>
        <Button size="lg" variant="subtle" color="gray" onClick={onClose}>
          Stay signed in
        </Button>
      </Stack>
    </Modal>
  );
}
