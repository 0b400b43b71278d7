import { chainReadingFromRuler, formatMm, rulerLengthMm, type AnnotationDocument, type RulerShape } from '@benchproof/annotation';
import { Alert, Button, Group, NumberInput, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useChainReading } from '../api/annotation';

interface Props {
  mediaId: number;
  doc: AnnotationDocument;
  ruler: RulerShape;
  /** The saved version the reading is taken from, or null while changes are unsaved. */
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

function rulerLabel(doc: AnnotationDocument, ruler: RulerShape): string {
  const mm = rulerLengthMm(doc, ruler.id);
  return mm === null ? 'No scale yet' : `Ruler: ${formatMm(mm)}`;
}

/** Why a photo reading is evidence for the owner and not a replacement for the chain checker (common practice, no source). */
function PhotoReadingCaution() {
  return (
    <Alert color="yellow" variant="light" title="How far to trust a photo reading">
      The camera must face the chain square-on and the rule must lie in the chain&apos;s plane; lens distortion and a tilted camera each add error near the
      frame edges. A chain checker or a steel rule over 24 pitches at the bench remains the reference; use the photo to show the owner, and confirm a borderline
      reading with the tool.
    </Alert>
  );
}

/** Chain wear from the photo: a ruler over N pitches, recorded on the chain checkpoint with this photo as evidence. */
export function ChainPanel({ mediaId, doc, ruler, savedVersion, onPitches }: Props) {
  const [pitches, setPitches] = useState<number>(ruler.pitches ?? 24);
  const record = useChainReading(mediaId);
  const p = preview(doc, ruler, pitches);
  const error = record.error instanceof ApiError ? (record.error.fieldErrors().rulerId ?? record.error.message) : null;
  return (
    <Stack gap="xs" p="sm" bg="white" data-testid="chain-panel">
      <Group align="flex-end" wrap="wrap">
        <NumberInput
          label="Pitches under the ruler (pin to pin; a full link is 2)"
          size="md"
          w={220}
          min={2}
          max={240}
          value={pitches}
          onChange={(v) => {
            const n = Number(v);
            setPitches(n);
            if (Number.isInteger(n) && n >= 2) onPitches(n);
          }}
        />
        <Button
          size="md"
          h={48}
          disabled={!p.ok || savedVersion === null}
          loading={record.isPending}
          onClick={() => savedVersion !== null && record.mutate({ rulerId: ruler.id, pitches, version: savedVersion })}
        >
          Record chain wear
        </Button>
      </Group>
      <Text fw={700} data-testid="ruler-length">
        {rulerLabel(doc, ruler)}
      </Text>
      <Text fw={600} data-testid="chain-preview">
        {p.text}
      </Text>
      {record.data && (
        <Text c="green.8" data-testid="chain-recorded">
          Recorded: {record.data.result.message}
        </Text>
      )}
      {error && <Text c="red.8">{error}</Text>}
      <PhotoReadingCaution />
    </Stack>
  );
}
