import { chainReadingFromRuler, formatMm, type AnnotationDocument, type RulerShape } from '@benchproof/annotation';
import { Button, Group, NumberInput, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useChainReading } from '../api/annotation';
import classes from './annotate-editor.module.css';

interface Props {
  mediaId: number;
  doc: AnnotationDocument;
  ruler: RulerShape;
  savedVersion: number | null;
  onPitches: (pitches: number) => void;
}

function preview(doc: AnnotationDocument, ruler: RulerShape, pitches: number): { text: string; ok: boolean } {
  try {
    const r = chainReadingFromRuler(doc, ruler.id, pitches);
    if (!r || r.measuredMm === null) return { text: 'Set a scale first: draw it over the steel rule.', ok: false };
    return { text: `${formatMm(r.measuredMm)} over ${pitches} pitches = ${r.elongationPct.toFixed(2)} % elongation`, ok: true };
  } catch (err) {
    return { text: (err as Error).message, ok: false };
  }
}

/** How many pitches the ruler spans: typed on the numeric keyboard, 44 px tall. */
function PitchesInput({ value, onChange }: { value: number; onChange: (n: number) => void }) {
  return (
    <NumberInput
      label="Pitches under the ruler (a full link is 2)"
      size="md"
      style={{ flex: 1 }}
      min={2}
      max={240}
      hideControls
      inputMode="numeric"
      classNames={{ input: classes.tallInput }}
      value={value}
      onChange={(v) => onChange(Number(v))}
    />
  );
}

/** How far to trust a photo reading (common workshop practice, no published source). */
function PhotoCaution() {
  return (
    <Text size="xs" c="dimmed">
      Hold the camera square to the chain with the rule in the chain&apos;s plane; tilt and lens distortion add error near the edges. Confirm a borderline
      reading with a chain checker or a steel rule at the bench.
    </Text>
  );
}

/**
 * Chain wear from the photo: a ruler over N pitches, recorded on the chain checkpoint with this
 * photo as evidence. The caution is common workshop practice (no published source): a photo
 * shows the owner; the chain checker or a steel rule at the bench stays the reference.
 */
export function ChainWear({ mediaId, doc, ruler, savedVersion, onPitches }: Props) {
  const [pitches, setPitches] = useState<number>(ruler.pitches ?? 24);
  const record = useChainReading(mediaId);
  const p = preview(doc, ruler, pitches);
  const error = record.error instanceof ApiError ? (record.error.fieldErrors().rulerId ?? record.error.message) : null;
  return (
    <Stack gap={6} mt="xs" data-testid="chain-panel">
      <Group align="flex-end" wrap="nowrap" gap="xs">
        <PitchesInput
          value={pitches}
          onChange={(n) => {
            setPitches(n);
            if (Number.isInteger(n) && n >= 2) onPitches(n);
          }}
        />
        <Button
          size="md"
          h={44}
          disabled={!p.ok || savedVersion === null}
          loading={record.isPending}
          onClick={() => savedVersion !== null && record.mutate({ rulerId: ruler.id, pitches, version: savedVersion })}
        >
          Record
        </Button>
      </Group>
      <Text fw={600} size="sm" data-testid="chain-preview">
        {p.text}
      </Text>
      {record.data && (
        <Text c="green.8" size="sm" data-testid="chain-recorded">
          Recorded: {record.data.result.message}
        </Text>
      )}
      {error && (
        <Text c="red.8" size="sm">
          {error}
        </Text>
      )}
      <PhotoCaution />
    </Stack>
  );
}
