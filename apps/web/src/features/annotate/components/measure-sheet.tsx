import { formatMm, rulerLengthMm, type AnnotationDocument, type RulerShape } from '@benchproof/annotation';
import { CloseButton, Group, SegmentedControl, Text } from '@mantine/core';
import classes from './annotate-editor.module.css';
import { ChainWear } from './chain-wear';

interface Props {
  mediaId: number;
  doc: AnnotationDocument;
  ruler: RulerShape;
  /** The saved version the reading is taken from, or null while changes are unsaved. */
  savedVersion: number | null;
  /** The ruler with `pitches` set (measuring a chain) or removed (a plain length). */
  onPitches: (pitches: number | undefined) => void;
  onClose: () => void;
}

const MODES = [
  { value: 'length', label: 'Length' },
  { value: 'chain', label: 'Chain wear' },
];

/**
 * The selected ruler's measurement, as a sheet over the bottom of the photo that closes with
 * one tap. A plain length by default; the chain wording appears only when the mechanic says
 * the ruler lies over a chain.
 */
export function MeasureSheet({ mediaId, doc, ruler, savedVersion, onPitches, onClose }: Props) {
  const mm = rulerLengthMm(doc, ruler.id);
  const chain = ruler.pitches !== undefined;
  return (
    <section className={classes.sheet} aria-label="Measurement" data-testid="measure-sheet">
      <Group justify="space-between" wrap="nowrap" gap="xs">
        <Text fw={700} data-testid="ruler-length">
          {mm === null ? 'No scale yet: draw a scale over something of known length' : `Ruler: ${formatMm(mm)}`}
        </Text>
        <CloseButton size={44} aria-label="Close the measurement" onClick={onClose} />
      </Group>
      <SegmentedControl
        fullWidth
        size="md"
        mt={4}
        value={chain ? 'chain' : 'length'}
        onChange={(m) => onPitches(m === 'chain' ? 24 : undefined)}
        data={MODES}
        aria-label="What are you measuring?"
        classNames={{ label: classes.segmentLabel }}
      />
      {chain && <ChainWear mediaId={mediaId} doc={doc} ruler={ruler} savedVersion={savedVersion} onPitches={onPitches} />}
    </section>
  );
}
