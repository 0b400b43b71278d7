import type { MediaAssetDto } from '@benchproof/contracts';
import { isVideoKind } from '@benchproof/domain';
import { Button, Group } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPencil, IconScan, IconTrash } from '@tabler/icons-react';
import { Link } from 'react-router';
import { useDeleteMedia } from '../api/media';
import { ConfirmDelete } from '../components/confirm-delete';
import { LinkToFinding } from './link-to-finding';

/** What can be done with the shot on screen: link it to a finding, grab stills, annotate, delete. */
export function ViewerActions({ jobId, asset, onDeleted }: { jobId: number; asset: MediaAssetDto; onDeleted: () => void }) {
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
