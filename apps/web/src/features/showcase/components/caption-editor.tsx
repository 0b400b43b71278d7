import type { ShowcaseItemDto } from '@benchproof/contracts';
import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { fetchCaptionDraft, useUpdateShowcaseItem } from '../api/showcase';

/** Edit a caption before export; "Draft from the job" fills our template text (no owner name, bike only if allowed). */
export function CaptionEditor({ item, opened, onClose }: { item: ShowcaseItemDto; opened: boolean; onClose: () => void }) {
  const [text, setText] = useState(item.caption);
  const [drafting, setDrafting] = useState(false);
  const [draftError, setDraftError] = useState<string | null>(null);
  const save = useUpdateShowcaseItem(item.pairId);
  const error = save.error instanceof ApiError ? (save.error.fieldErrors().caption ?? save.error.message) : draftError;
  const draft = async () => {
    setDrafting(true);
    setDraftError(null);
    try {
      setText((await fetchCaptionDraft(item.pairId)).caption);
    } catch (e) {
      setDraftError(e instanceof ApiError ? e.message : 'Could not draft a caption.');
    } finally {
      setDrafting(false);
    }
  };
  return (
    <Modal opened={opened} onClose={onClose} title="Caption" size="lg">
      <Stack>
        <Textarea
          label="Caption for this pair"
          autosize
          minRows={3}
          maxLength={300}
          value={text}
          onChange={(e) => setText(e.currentTarget.value)}
          error={error}
        />
        <Text size="sm" c="dimmed">
          {item.consent.nameMakeModel ? 'The owner allowed naming the bike’s make and model.' : 'The owner did not allow naming the bike’s make or model.'}{' '}
          Never name the owner.
        </Text>
        <Group justify="space-between">
          <Button size="md" variant="light" loading={drafting} onClick={() => void draft()}>
            Draft from the job
          </Button>
          <Button size="md" loading={save.isPending} onClick={() => save.mutate({ caption: text }, { onSuccess: onClose })}>
            Save caption
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
