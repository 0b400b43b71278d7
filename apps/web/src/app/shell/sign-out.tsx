import { ActionIcon, Button, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconLogout } from '@tabler/icons-react';
import { useNavigate } from 'react-router';
import { useLogout } from '../../features/auth';
import { detachShots, useWaitingCount } from '../../features/media';

/**
 * Sign-out. With shots still waiting on this phone it first asks: keep them for this user's next sign-in, or
 * delete them. Either way they leave the screen, so the next person on a shared phone never sees them.
 */
export function SignOutButton() {
  const logout = useLogout();
  const navigate = useNavigate();
  const waiting = useWaitingCount();
  const [asking, { open, close }] = useDisclosure(false);
  const ask = () => (waiting ? open() : signOut(true));
  function signOut(keep: boolean) {
    close();
    void detachShots(keep);
    logout.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });
  }
  return (
    <>
      <Button variant="subtle" color="gray" leftSection={<IconLogout size={20} />} onClick={ask} loading={logout.isPending} visibleFrom="xs">
        Sign out
      </Button>
      {/* On a phone the header also carries the upload badge: sign-out is an icon there, like the key. */}
      <ActionIcon variant="subtle" color="gray" size={44} onClick={ask} loading={logout.isPending} hiddenFrom="xs" aria-label="Sign out" title="Sign out">
        <IconLogout size={22} />
      </ActionIcon>
      <Modal opened={asking} onClose={close} title="Shots still waiting" centered>
        <Stack gap="md">
          <Text>
            {waiting === 1 ? '1 shot has' : `${waiting} shots have`} not reached the workshop server yet. Keep them on this phone to send after your next
            sign-in, or delete them?
          </Text>
          <Button size="lg" onClick={() => signOut(true)}>
            Keep for my next sign-in
          </Button>
          <Button size="lg" color="red" variant="light" onClick={() => signOut(false)}>
            Delete the waiting shots
          </Button>
          <Button size="lg" variant="subtle" color="gray" onClick={close}>
            Stay signed in
          </Button>
        </Stack>
      </Modal>
    </>
  );
}
