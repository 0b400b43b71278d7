import type { ShowcaseItemDto } from '@benchproof/contracts';
import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { fetchCaptionDraft, useUpdateShowcaseItem } from '../api/showcase';

type Problem = (e: ApiError) => string;

/** Per error code, what goes under the caption box; other codes show the server's message. */
const CAPTION_PROBLEMS: Partial<Record<ApiError['code'], Problem>> = {
  VALIDATION_FAILED: (e) => e.fieldErrors().caption ?? e.message,
  // With a caption issue: the text names the bike and the owner did not allow that.
  NO_CONSENT: (e) => (e.fieldErrors().caption ? `${e.fieldErrors().caption} Take the make and model out, or use “Draft from the job”.` : e.message),
  CONSENT_REVOKED: (e) => `${e.message} This pair is leaving the library.`,
  FORBIDDEN: () => 'Only a manager can change captions.',
  NETWORK: () => 'No connection to the workshop server. Your text is kept; try again.',
};

/** What goes under the caption box when saving or drafting fails, by the API's error code. The typed text stays. */
export function captionProblem(e: unknown): string | null {
  if (!e) return null;
  if (!(e instanceof ApiError)) return 'The caption could not be saved. Your text is kept; try again.';
  return (CAPTION_PROBLEMS[e.code] ?? ((x: ApiError) => x.message))(e);
}

/** The caption being edited, the draft helper and the save, with one problem to show under the box. */
function useCaptionEdit(item: ShowcaseItemDto, onSaved: () => void) {
  const [text, setText] = useState(item.caption);
  const [drafting, setDrafting] = useState(false);
  const [draftError, setDraftError] = useState<unknown>(null);
  const save = useUpdateShowcaseItem(item.pairId);
  const draft = async () => {
    setDrafting(true);
    setDraftError(null);
    save.reset();
    try {
      setText((await fetchCaptionDraft(item.pairId)).caption);
    } catch (e) {
      setDraftError(e);
    } finally {
      setDrafting(false);
    }
  };
  const submit = () => {
    setDraftError(null);
    save.mutate({ caption: text }, { onSuccess: onSaved });
  };
  return { text, setText, drafting, draft, submit, saving: save.isPending, problem: captionProblem(save.error ?? draftError) };
}

/** Edit a caption before export; "Draft from the job" fills our template text (no owner name, bike only if allowed). */
export function CaptionEditor({ item, opened, onClose }: { item: ShowcaseItemDto; opened: boolean; onClose: () => void }) {
  const edit = useCaptionEdit(item, onClose);
  return (
    <Modal opened={opened} onClose={onClose} title="Caption" size="lg">
      <Stack>
        <Textarea
          label="Caption for this pair"
          autosize
          minRows={3}
          maxLength={300}
          value={edit.text}
          onChange={(e) => edit.setText(e.currentTarget.value)}
          error={edit.problem}
        />
        <Text size="sm" c="dimmed">
          {item.consent.nameMakeModel ? 'The owner allowed naming the bike’s make and model.' : 'The owner did not allow naming the bike’s make or model.'}{' '}
          Never name the owner.
        </Text>
        <Group justify="space-between">
          <Button size="md" variant="light" loading={edit.drafting} onClick={() => void edit.draft()}>
            Draft from the job
          </Button>
          <Button size="md" loading={edit.saving} onClick={edit.submit}>
            Save caption
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
