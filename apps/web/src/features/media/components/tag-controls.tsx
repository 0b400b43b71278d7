import { MEDIA_AREA_LABELS, MEDIA_AREAS, MEDIA_PHASE_LABELS, MEDIA_PHASES, type MediaArea, type MediaPhase } from '@benchproof/domain';
import { Chip, Group, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import type { ShotTags } from '../upload/queue';

const PHASE_DATA = MEDIA_PHASES.map((p) => ({ value: p, label: MEDIA_PHASE_LABELS[p] }));

/** Before / during / after as one wide three-way switch. */
export function PhaseControl({ value, onChange, label = 'Phase' }: { value: MediaPhase; onChange: (p: MediaPhase) => void; label?: string }) {
  return <SegmentedControl fullWidth size="lg" radius="md" aria-label={label} data={PHASE_DATA} value={value} onChange={(v) => onChange(v)} />;
}

/** The areas as big chips, one tap each. */
export function AreaChips({ value, onChange, label = 'Area' }: { value: MediaArea; onChange: (a: MediaArea) => void; label?: string }) {
  return (
    <Chip.Group multiple={false} value={value} onChange={(v) => onChange(v)}>
      <Group gap={8} role="radiogroup" aria-label={label}>
        {MEDIA_AREAS.map((a) => (
          <Chip key={a} value={a} size="md" radius="md" styles={{ label: { minHeight: 44, fontSize: 15 } }}>
            {MEDIA_AREA_LABELS[a]}
          </Chip>
        ))}
      </Group>
    </Chip.Group>
  );
}

/** Phase, area and caption together: the tags a shot carries. */
export function TagEditor({ value, onChange, name }: { value: ShotTags; onChange: (patch: Partial<ShotTags>) => void; name: string }) {
  return (
    <Stack gap="sm">
      <PhaseControl value={value.phase} onChange={(phase) => onChange({ phase })} label={`Phase for ${name}`} />
      <Text size="sm" fw={600}>
        Area
      </Text>
      <AreaChips value={value.area} onChange={(area) => onChange({ area })} label={`Area for ${name}`} />
      <TextInput
        label="Caption (optional)"
        placeholder="What the shot shows"
        maxLength={500}
        value={value.caption}
        onChange={(e) => onChange({ caption: e.currentTarget.value })}
      />
    </Stack>
  );
}
