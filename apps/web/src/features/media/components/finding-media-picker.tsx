import { Alert, Button, Group, Image, Modal, SimpleGrid, Stack, Text, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { MediaAssetDto } from '@benchproof/contracts';
import { IconCheck, IconPencil, IconPhotoPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router';
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
            <UnstyledButton
              key={a.id}
              onClick={() => flip(a.id)}
              aria-pressed={on}
              aria-label={`Shot ${a.id}${a.caption ? `: ${a.caption}` : ''}`}
              pos="relative"
              style={{ outline: on ? '3px solid var(--mantine-color-bench-7)' : undefined, borderRadius: 8, overflow: 'hidden' }}
            >
              <Image src={a.urls.thumb ?? a.urls.poster ?? undefined} h={96} fit="cover" alt="" />
              {on && (
                <IconCheck style={{ position: 'absolute', top: 4, right: 4, color: 'white', background: 'var(--mantine-color-bench-7)', borderRadius: 99 }} />
              )}
            </UnstyledButton>
          );
        })}
      </SimpleGrid>
      <Group justify="flex-end">
        <Button onClick={() => onSave(picked)} loading={busy}>{`Link ${picked.length} shots`}</Button>
      </Group>
    </Stack>
  );
}

/** The server's annotated render when the shot is a still; a video shows its poster. */
const evidenceSrc = (a: MediaAssetDto) =>
  a.kind === 'photo' || a.kind === 'scope_still' ? `/api/media/${a.id}/annotated/screen` : (a.urls.thumb ?? a.urls.poster ?? undefined);

/** One linked shot, large: the annotated image, with the way into the editor. */
function EvidenceViewer({ jobId, asset, onClose }: { jobId: number; asset: MediaAssetDto | null; onClose: () => void }) {
  return (
    <Modal opened={asset !== null} onClose={onClose} title={asset?.caption || 'Shot'} size="xl">
      {asset && (
        <Stack>
          <Image src={evidenceSrc(asset)} alt={asset.caption || `Shot ${asset.id}`} fit="contain" mah="70dvh" data-testid="evidence-large" />
          {(asset.kind === 'photo' || asset.kind === 'scope_still') && (
            <Group justify="flex-end">
              <Button size="md" component={Link} to={`/jobs/${jobId}/media/${asset.id}/annotate`} leftSection={<IconPencil size={18} />}>
                Annotate
              </Button>
            </Group>
          )}
        </Stack>
      )}
    </Modal>
  );
}

/** For the findings UI (composed in the route): the shots linked to one finding, and a chooser to change them. */
export function FindingMediaPicker({ jobId, findingId, canEdit = true }: { jobId: number; findingId: number; canEdit?: boolean }) {
  const [opened, { open, close }] = useDisclosure(false);
  const [viewing, setViewing] = useState<MediaAssetDto | null>(null);
  const linked = useFindingMedia(jobId, findingId);
  const link = useLinkFindingMedia(jobId);
  const assets = linked.data?.assets ?? [];
  return (
    <Stack gap={6}>
      <Group gap={6}>
        {assets.map((a) => (
          <UnstyledButton key={a.id} onClick={() => setViewing(a)} aria-label={`Open shot ${a.caption || a.id}`} data-testid="finding-evidence">
            <Image src={evidenceSrc(a)} w={72} h={72} radius="sm" fit="cover" alt="" />
          </UnstyledButton>
        ))}
        {canEdit && (
          <Button variant="light" h={48} leftSection={<IconPhotoPlus size={18} />} onClick={open}>
            {assets.length ? 'Change shots' : 'Link shots'}
          </Button>
        )}
      </Group>
      {assets.length === 0 && (
        <Text size="sm" c="dimmed">
          No shots linked yet.
        </Text>
      )}
      {link.error && (
        <Alert color="red" role="alert">
          {link.error.message}
        </Alert>
      )}
      <EvidenceViewer jobId={jobId} asset={viewing} onClose={() => setViewing(null)} />
      <Modal opened={opened} onClose={close} title="Shots for this finding" size="xl">
        {opened && (
          <ChooseShots
            jobId={jobId}
            initial={assets.map((a) => a.id)}
            busy={link.isPending}
            onSave={(ids) => link.mutate({ findingId, assetIds: ids }, { onSuccess: close })}
          />
        )}
      </Modal>
    </Stack>
  );
}
