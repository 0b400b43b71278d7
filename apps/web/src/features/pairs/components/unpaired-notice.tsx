import type { CreatePairRequest } from '@benchproof/contracts';
import { Alert, Button, Group, Text } from '@mantine/core';
import { useCreatePair } from '../api/pairs';

/** After an unpair: the pair's two shots, caption and crop, and one tap to put it back. */
export function UnpairedNotice({ jobId, removed, onDone }: { jobId: number; removed: CreatePairRequest; onDone: () => void }) {
  const create = useCreatePair(jobId);
  return (
    <Alert color="gray" role="status" withCloseButton closeButtonLabel="Dismiss" onClose={onDone}>
      <Group justify="space-between" wrap="nowrap">
        <Text size="sm">Pair removed. The two shots are back among the photos.</Text>
        <Button size="md" variant="light" loading={create.isPending} onClick={() => create.mutate(removed, { onSuccess: onDone })}>
          Undo
        </Button>
      </Group>
      {create.error && (
        <Text size="sm" c="red" role="alert">
          {create.error.message}
        </Text>
      )}
    </Alert>
  );
}
