import { PALETTE, PALETTE_COLOURS, STROKE_WIDTH_NAMES } from '@benchproof/annotation';
import { ActionIcon, Group, SegmentedControl, Tooltip } from '@mantine/core';
import {
  IconArrowBackUp,
  IconArrowForwardUp,
  IconArrowUpRight,
  IconBlur,
  IconCircle,
  IconPointer,
  IconRuler,
  IconRuler2,
  IconSignature,
  IconTag,
  IconTrash,
  IconZoomIn,
  IconZoomOut,
} from '@tabler/icons-react';
import type { ReactNode } from 'react';
import type { Style, Tool } from '../model/edit';

const TOOL_ICONS: Record<Tool, [ReactNode, string, string]> = {
  select: [<IconPointer key="s" />, 'Select and move', 'V'],
  ring: [<IconCircle key="r" />, 'Ring', 'R'],
  arrow: [<IconArrowUpRight key="a" />, 'Arrow', 'A'],
  pen: [<IconSignature key="p" />, 'Pen', 'P'],
  label: [<IconTag key="l" />, 'Label', 'T'],
  scale: [<IconRuler2 key="c" />, 'Set scale', 'S'],
  ruler: [<IconRuler key="m" />, 'Measure', 'M'],
  blur: [<IconBlur key="b" />, 'Blur box (hide serials, faces)', 'B'],
};
export const TOOL_KEYS: Record<string, Tool> = Object.fromEntries(Object.entries(TOOL_ICONS).map(([t, [, , k]]) => [k.toLowerCase(), t as Tool]));

interface Props {
  tool: Tool;
  onTool: (t: Tool) => void;
  style: Style;
  onStyle: (s: Style) => void;
  canUndo: boolean;
  canRedo: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onDelete: (() => void) | null;
  onZoomIn: () => void;
  onZoomOut: () => void;
}

/** Big targets (48 px) for a finger or a stylus at the workstand; shortcuts in the tooltips. */
export function AnnotateToolbar(p: Props) {
  const icon = (label: string, onClick: () => void, node: ReactNode, opts: { active?: boolean; disabled?: boolean; color?: string } = {}) => (
    <Tooltip label={label} key={label}>
      <ActionIcon
        size={48}
        variant={opts.active ? 'filled' : 'light'}
        color={opts.color}
        disabled={opts.disabled}
        aria-label={label}
        aria-pressed={opts.active}
        onClick={onClick}
      >
        {node}
      </ActionIcon>
    </Tooltip>
  );
  return (
    <Group gap={6} p={6} wrap="wrap" bg="dark.7" data-testid="annotate-toolbar">
      {(Object.keys(TOOL_ICONS) as Tool[]).map((t) =>
        icon(`${TOOL_ICONS[t][1]} (${TOOL_ICONS[t][2]})`, () => p.onTool(t), TOOL_ICONS[t][0], { active: p.tool === t }),
      )}
      {icon('Undo (Ctrl+Z)', p.onUndo, <IconArrowBackUp />, { disabled: !p.canUndo })}
      {icon('Redo (Ctrl+Shift+Z)', p.onRedo, <IconArrowForwardUp />, { disabled: !p.canRedo })}
      {icon('Delete (Del)', () => p.onDelete?.(), <IconTrash />, { disabled: !p.onDelete, color: 'red' })}
      {icon('Zoom in (+)', p.onZoomIn, <IconZoomIn />)}
      {icon('Zoom out (−)', p.onZoomOut, <IconZoomOut />)}
      <Group gap={4}>
        {PALETTE_COLOURS.map((c) => (
          <ActionIcon
            key={c}
            size={44}
            radius="xl"
            aria-label={`Colour ${c}`}
            aria-pressed={p.style.colour === c}
            onClick={() => p.onStyle({ ...p.style, colour: c })}
            style={{
              background: PALETTE[c].ink,
              border: `${p.style.colour === c ? 5 : 3}px solid ${PALETTE[c].outline}`,
              outline: p.style.colour === c ? '3px solid #fff' : undefined,
            }}
          />
        ))}
      </Group>
      <SegmentedControl
        size="md"
        value={p.style.width}
        onChange={(w) => p.onStyle({ ...p.style, width: w })}
        data={STROKE_WIDTH_NAMES.map((w) => ({ value: w, label: w }))}
        aria-label="Stroke width"
      />
    </Group>
  );
}
