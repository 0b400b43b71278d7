import { MEDIA_AREA_LABELS, MEDIA_PHASE_LABELS } from '@benchproof/domain';
import { Button, Collapse, Stack } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconTag } from '@tabler/icons-react';
import { TagEditor } from '../components/tag-controls';
import type { ShotTags } from '../upload/queue';

/** Scope stills default to "before · frame interior"; the tags fold away until needed. */
export const SCOPE_TAGS: ShotTags = { phase: 'before', area: 'frame_interior', caption: '' };

export function ScopeTags({ value, onChange }: { value: ShotTags; onChange: (t: ShotTags) => void }) {
  const [open, { toggle }] = useDisclosure(false);
  return (
    <Stack gap="xs">
      <Button variant="subtle" leftSection={<IconTag size={18} />} onClick={toggle} aria-expanded={open} justify="flex-start">
        {`Tags: ${MEDIA_PHASE_LABELS[value.phase]} · ${MEDIA_AREA_LABELS[value.area]}`}
      </Button>
      <Collapse expanded={open}>
        <TagEditor value={value} onChange={(patch) => onChange({ ...value, ...patch })} name="grabbed stills" />
      </Collapse>
    </Stack>
  );
}
