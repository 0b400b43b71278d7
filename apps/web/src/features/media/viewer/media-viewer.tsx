import type { MediaAssetDto } from '@benchproof/contracts';
import { isVideoKind } from '@benchproof/domain';
import { ActionIcon, Box, Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure, useWindowEvent } from '@mantine/hooks';
import { IconChevronLeft, IconChevronRight, IconPencil, IconScan, IconTrash, IconX } from '@tabler/icons-react';
import { Link } from 'react-router';
import { useDeleteMedia } from '../api/media';
import { ConfirmDelete } from '../components/confirm-delete';
import { LinkToFinding } from './link-to-finding';
import { MediaDetails } from './media-details';
import { MediaStage } from './media-stage';
import { useSwipe } from './use-swipe';

interface Props {
  jobId: number;
  assets: MediaAssetDto[];
  index: number | null;
  onIndex: (i: number | null) => void;
}

function ViewerActions({ jobId, asset, onDeleted }: { jobId: number; asset: MediaAssetDto; onDeleted: () => void }) {
  const [confirming, confirm] = useDisclosure(false);
  const remove = useDeleteMedia(jobId);
  return (
    <Group gap="sm" align="flex-end">
      <LinkToFinding key={asset.id} jobId={jobId} assetId={asset.id} />
      {isVideoKind(asset.kind) && (
        <Button component={Link} to={`/jobs/${jobId}/scope?video=${asset.id}`} variant="light" leftSection={<IconScan size={18} />}>
          Grab stills
        </Button>
      )}
      {(asset.kind === 'photo' || asset.kind === 'scope_still') && asset.status === 'ready' && !asset.deletedAt && (
        <Button component={Link} to={`/jobs/${jobId}/media/${asset.id}/annotate`} variant="light" leftSection={<IconPencil size={18} />}>
          Annotate
        </Button>
      )}
      {!asset.deletedAt && (
        <Button color="red" variant="light" leftSection={<IconTrash size={18} />} onClick={confirm.open}>
          Delete
        </Button>
      )}
      <ConfirmDelete
        count={1}
        opened={confirming}
        onClose={confirm.close}
        busy={remove.isPending}
        onConfirm={() =>
          remove.mutate([asset.id], {
            onSuccess: () => {
              confirm.close();
              onDeleted();
            },
          })
        }
      />
    </Group>
  );
}

/** Full-screen viewer: swipe or arrow keys to move, details and actions underneath. */
export function MediaViewer({ jobId, assets, index, onIndex }: Props) {
  const count = assets.length;
  const asset = index === null ? undefined : assets[Math.min(index, count - 1)];
  const at = index === null ? 0 : Math.min(index, count - 1);
  const prev = () => count && onIndex((at - 1 + count) % count);
  const next = () => count && onIndex((at + 1) % count);
  const swipe = useSwipe(prev, next);
  useWindowEvent('keydown', (e) => {
    if (index === null) return;
    if (e.key === 'ArrowLeft') prev();
    if (e.key === 'ArrowRight') next();
  });

  return (
    <Modal
      opened={Boolean(asset)}
      onClose={() => onIndex(null)}
      fullScreen
      withCloseButton={false}
      padding={0}
      transitionProps={{ duration: 0 }}
      aria-label="Shot viewer"
    >
      {asset && (
        <Stack gap={0} h="100dvh" bg="dark.8">
          <Group justify="space-between" p="xs" c="white">
            <Text fw={600} data-testid="viewer-position">{`${at + 1} of ${count}`}</Text>
            <ActionIcon size={48} variant="subtle" color="gray.0" aria-label="Close viewer" onClick={() => onIndex(null)}>
              <IconX />
            </ActionIcon>
          </Group>
          <Box
            {...swipe}
            data-testid="viewer-stage"
            style={{
              ...swipe.style,
              flex: 1,
              minHeight: 0,
              display: 'flex',
              alignItems: 'center',
              justifyContent: 'center',
              position: 'relative',
              userSelect: 'none',
            }}
          >
            <MediaStage asset={asset} />
            <ActionIcon size={56} radius="xl" variant="filled" color="dark" pos="absolute" left={8} aria-label="Previous shot" onClick={prev} visibleFrom="sm">
              <IconChevronLeft />
            </ActionIcon>
            <ActionIcon size={56} radius="xl" variant="filled" color="dark" pos="absolute" right={8} aria-label="Next shot" onClick={next} visibleFrom="sm">
              <IconChevronRight />
            </ActionIcon>
          </Box>
          <Stack gap="sm" p="md" bg="white">
            <MediaDetails asset={asset} />
            <ViewerActions jobId={jobId} asset={asset} onDeleted={() => onIndex(count > 1 ? at % (count - 1) : null)} />
          </Stack>
        </Stack>
      )}
    </Modal>
  );
}
