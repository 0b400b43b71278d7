import type { MediaAssetDto } from '@benchproof/contracts';
import { ActionIcon, Box, Group, Modal, Stack, Text } from '@mantine/core';
import { IconChevronLeft, IconChevronRight, IconX } from '@tabler/icons-react';
import { MediaDetails } from './media-details';
import { MediaStage, type RenderStill } from './media-stage';
import { useSwipe } from './use-swipe';
import { useViewerNav } from './use-viewer-nav';
import { ViewerActions } from './viewer-actions';

interface Props {
  jobId: number;
  assets: MediaAssetDto[];
  index: number | null;
  onIndex: (i: number | null) => void;
  renderStill?: RenderStill;
}

/** The shot itself, with swipe on touch and big previous/next buttons on wider screens. */
function ViewerStage({ asset, onPrev, onNext, renderStill }: { asset: MediaAssetDto; onPrev: () => void; onNext: () => void; renderStill?: RenderStill }) {
  const swipe = useSwipe(onPrev, onNext);
  return (
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
      <MediaStage asset={asset} renderStill={renderStill} />
      <ActionIcon size={56} radius="xl" variant="filled" color="dark" pos="absolute" left={8} aria-label="Previous shot" onClick={onPrev} visibleFrom="sm">
        <IconChevronLeft />
      </ActionIcon>
      <ActionIcon size={56} radius="xl" variant="filled" color="dark" pos="absolute" right={8} aria-label="Next shot" onClick={onNext} visibleFrom="sm">
        <IconChevronRight />
      </ActionIcon>
    </Box>
  );
}

/** Full-screen viewer: swipe or arrow keys to move, details and actions underneath. */
export function MediaViewer({ jobId, assets, index, onIndex, renderStill }: Props) {
  const { asset, at, count, prev, next } = useViewerNav(assets, index, onIndex);
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
          <ViewerStage asset={asset} onPrev={prev} onNext={next} renderStill={renderStill} />
          <Stack gap="sm" p="md" bg="white">
            <MediaDetails asset={asset} />
            <ViewerActions jobId={jobId} asset={asset} onDeleted={() => onIndex(count > 1 ? at % (count - 1) : null)} />
          </Stack>
        </Stack>
      )}
    </Modal>
  );
}
