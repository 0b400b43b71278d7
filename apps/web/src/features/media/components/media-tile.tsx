import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_KIND_LABELS, isVideoKind } from '@benchproof/domain';
import { AspectRatio, Badge, Box, Center, Checkbox, Image, Loader, Stack, Text, UnstyledButton } from '@mantine/core';
import { IconAlertTriangle, IconPlayerPlayFilled } from '@tabler/icons-react';

function TileBody({ asset }: { asset: MediaAssetDto }) {
  const src = asset.urls.thumb ?? asset.urls.poster;
  if (asset.status === 'failed') {
    return (
      <Center h="100%" bg="red.0" p={4}>
        <Stack gap={2} align="center">
          <IconAlertTriangle color="var(--mantine-color-red-7)" />
          <Text size="xs" ta="center" c="red.8">
            {asset.derivativeError ?? 'Sizes could not be made'}
          </Text>
        </Stack>
      </Center>
    );
  }
  if (asset.status === 'pending' || !src) {
    return (
      <Center h="100%" bg="gray.1">
        <Loader size="sm" aria-label="Making sizes" />
      </Center>
    );
  }
  return <Image src={src} h="100%" w="100%" fit="cover" alt={asset.caption || `${MEDIA_KIND_LABELS[asset.kind]} ${asset.id}`} loading="lazy" />;
}

/** Corner marks over the thumbnail: a video, a scope still, a deleted shot. */
function TileMarks({ asset }: { asset: MediaAssetDto }) {
  return (
    <>
      {isVideoKind(asset.kind) && (
        <Box pos="absolute" bottom={6} right={6} c="white" style={{ filter: 'drop-shadow(0 0 2px black)', pointerEvents: 'none' }}>
          <IconPlayerPlayFilled size={22} />
        </Box>
      )}
      {asset.source === 'scope' && (
        <Badge pos="absolute" top={6} right={6} size="sm" color="brass" variant="filled">
          Scope
        </Badge>
      )}
      {asset.deletedAt && (
        <Badge pos="absolute" bottom={6} left={6} size="sm" color="red">
          Deleted
        </Badge>
      )}
    </>
  );
}

/** A square thumbnail that opens the viewer; the corner box selects it for bulk actions. */
export function MediaTile({
  asset,
  selected,
  onSelect,
  onOpen,
}: {
  asset: MediaAssetDto;
  selected: boolean;
  onSelect: (on: boolean) => void;
  onOpen: () => void;
}) {
  const label = asset.caption || `${MEDIA_KIND_LABELS[asset.kind]} ${asset.id}`;
  return (
    <Box pos="relative" data-testid="media-tile" data-status={asset.status} data-kind={asset.kind} data-area={asset.area}>
      <UnstyledButton
        onClick={onOpen}
        aria-label={`Open ${label}`}
        w="100%"
        style={{ borderRadius: 8, overflow: 'hidden', display: 'block', opacity: asset.deletedAt ? 0.5 : 1 }}
      >
        <AspectRatio ratio={1}>
          <TileBody asset={asset} />
        </AspectRatio>
      </UnstyledButton>
      <Checkbox
        size="md"
        pos="absolute"
        top={6}
        left={6}
        aria-label={`Select ${label}`}
        checked={selected}
        onChange={(e) => onSelect(e.currentTarget.checked)}
        styles={{ input: { boxShadow: '0 0 0 2px white' } }}
      />
      <TileMarks asset={asset} />
    </Box>
  );
}
