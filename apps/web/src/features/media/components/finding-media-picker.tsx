import { Alert, Button, Group, Image, Modal, SimpleGrid, Stack, Text, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconCheck, IconPhotoPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { useFindingMedia, useLinkFindingMedia, useMedia } from '../api/media';

function ChooseShots({ jobId, initial, onSave, busy }: { jobId: number; initial: number[]; onSave: (ids: number[]) => void; busy: boolean }) {
  const { data } = useMedia(jobId);
  const [picked, setPicked] = useState<number[]>(initial);
  const flip = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p, id]));
  return (
    <Stack>
      <SimpleGrid cols={{ base: 3, sm: 5 }} spacing={8}>
        {(data ?? []).map((a) => {
          const on = picked.includes(a.id);
          return (
            <UnstyledButton key={a.id} onClick={() => flip(a.id)} aria-pressed={on} aria-label={`Shot ${a.id}${a.caption ? `: ${a.caption}` : ''}`} pos="relative" style={{ outline: on ? '3px solid var(--mantine-color-bench-7)' : undefined, borderRadius: 8, overflow: 'hidden' }}>
              <Image src={a.urls.thumb ?? a.urls.poster ?? undefined} h={96} fit="cover" alt="" />
              {on && <IconCheck style={{ position: 'absolute', top: 4, right: 4, color: 'white', background: 'var(--mantine-color-bench-7)', borderRadius: 99 }} />}
            </UnstyledButton>
          );
        })}
      </SimpleGrid>
      <Group justify="flex-end"><Button onClick={() => onSave(picked)} loading={busy}>{`Link ${picked.length} shots`}</Button></Group>
    </Stack>
  );
}

/** For the findings UI (composed in the route): the shots linked to one finding, and a chooser to change them. */
export function FindingMediaPicker({ jobId, findingId }: { jobId: number; findingId: number }) {
  const [opened, { open, close }] = useDisclosure(false);
  const linked = useFindingMedia(jobId, findingId);
  const link = useLinkFindingMedia(jobId);
  const assets = linked.data?.assets ?? [];
  return (
    <Stack gap={6}>
      <Group gap={6}>
        {assets.map((a) => <Image key={a.id} src={a.urls.thumb ?? a.urls.poster ?? undefined} w={56} h={56} radius="sm" fit="cover" alt={a.caption || `Shot ${a.id}`} />)}
        <Button variant="light" leftSection={<IconPhotoPlus size={18} />} onClick={open}>{assets.length ? 'Change shots' : 'Link shots'}</Button>
      </Group>
      {assets.length === 0 && <Text size="sm" c="dimmed">No shots linked yet.</Text>}
      {link.error && <Alert color="red" role="alert">{link.error.message}</Alert>}
      <Modal opened={opened} onClose={close} title="Shots for this finding" size="xl">
        {opened && <ChooseShots jobId={jobId} initial={assets.map((a) => a.id)} busy={link.isPending} onSave={(ids) => link.mutate({ findingId, assetIds: ids }, { onSuccess: close })} />}
      </Modal>
    </Stack>
  );
}
