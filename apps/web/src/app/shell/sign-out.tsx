import { ActionIcon, Button } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconLogout } from '@tabler/icons-react';
import { lazy, Suspense } from 'react';
import { useNavigate } from 'react-router';
import { useLogout } from '../../features/auth';
import { detachShots, useWaitingCount } from '../../features/media';

// The dialog (Modal with its focus trap and scroll lock, ~30 KB gzip) loads only when someone signs out with shots waiting.
const WaitingShotsDialog = lazy(() => import('./waiting-shots-dialog').then((m) => ({ default: m.WaitingShotsDialog })));

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
      {asking && (
        <Suspense fallback={null}>
          <WaitingShotsDialog waiting={waiting} onChoose={signOut} onClose={close} />
        </Suspense>
      )}
    </>
  );
}
