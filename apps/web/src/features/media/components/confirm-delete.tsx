import { Button, Group, Modal, Text } from '@mantine/core';

/** Soft delete asks first; the original is kept until a manager purges it. */
export function ConfirmDelete({
  count,
  opened,
  onClose,
  onConfirm,
  busy,
}: {
  count: number;
  opened: boolean;
  onClose: () => void;
  onConfirm: () => void;
  busy: boolean;
}) {
  const what = count === 1 ? 'this shot' : `these ${count} shots`;
  return (
    <Modal opened={opened} onClose={onClose} title={`Delete ${what}?`} centered zIndex={400}>
      <Text mb="md">The job will no longer show {what}. The original stays stored until a manager purges it, and the deletion is recorded.</Text>
      <Group justify="flex-end">
        <Button variant="default" onClick={onClose}>
          Keep
        </Button>
        <Button color="red" onClick={onConfirm} loading={busy}>
          Delete
        </Button>
      </Group>
    </Modal>
  );
}
