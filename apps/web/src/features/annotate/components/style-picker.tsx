import { PALETTE, PALETTE_COLOURS, STROKE_WIDTH_NAMES, type StrokeWidth } from '@benchproof/annotation';
import { ActionIcon, Popover, SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import type { Style } from '../model/edit';
import classes from './annotate-editor.module.css';

const WIDTH_LABEL: Record<StrokeWidth, string> = { thin: 'Thin', medium: 'Medium', bold: 'Bold' };

/** Dot size per width: the button shows both choices at a glance. */
const DOT: Record<StrokeWidth, number> = { thin: 16, medium: 22, bold: 28 };

/** The current colour as a dot as big as the current width. */
function Swatch({ style }: { style: Style }) {
  const ink = PALETTE[style.colour];
  const d = DOT[style.width];
  return <span className={classes.swatch} style={{ background: ink.ink, borderColor: ink.outline, width: d, height: d }} />;
}

/** Colour and stroke width behind one 44 px button, for new marks and the selected one. */
export function StylePicker({ style, onStyle }: { style: Style; onStyle: (s: Style) => void }) {
  return (
    <Popover position="top-end" withArrow shadow="md" zIndex={350} trapFocus>
      <Popover.Target>
        <ActionIcon size={44} variant="subtle" color="gray.0" aria-label={`Colour and width: ${style.colour}, ${style.width}`} data-testid="style-button">
          <Swatch style={style} />
        </ActionIcon>
      </Popover.Target>
      <Popover.Dropdown>
        <Stack gap="xs" data-testid="style-popover">
          <Text size="sm" fw={600}>
            Colour
          </Text>
          <SimpleGrid cols={6} spacing={6}>
            {PALETTE_COLOURS.map((c) => (
              <ActionIcon
                key={c}
                size={44}
                radius="xl"
                aria-label={`Colour ${c}`}
                aria-pressed={style.colour === c}
                onClick={() => onStyle({ ...style, colour: c })}
                className={classes.colour}
                data-active={style.colour === c || undefined}
                style={{ background: PALETTE[c].ink, borderColor: PALETTE[c].outline }}
              />
            ))}
          </SimpleGrid>
          <Text size="sm" fw={600}>
            Width
          </Text>
          <SegmentedControl
            size="md"
            fullWidth
            value={style.width}
            onChange={(w) => onStyle({ ...style, width: w })}
            data={STROKE_WIDTH_NAMES.map((w) => ({ value: w, label: WIDTH_LABEL[w] }))}
            aria-label="Stroke width"
            classNames={{ label: classes.segmentLabel }}
          />
        </Stack>
      </Popover.Dropdown>
    </Popover>
  );
}
