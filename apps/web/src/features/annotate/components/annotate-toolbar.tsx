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

interface ToolButtonProps {
  label: string;
  onClick: () => void;
  children: ReactNode;
  active?: boolean;
  disabled?: boolean;
  color?: string;
}

/** One 48 px icon button, named by its tooltip text (which carries the shortcut). */
function ToolButton({ label, onClick, children, active, disabled, color }: ToolButtonProps) {
  return (
    <Tooltip label={label}>
      <ActionIcon size={48} variant={active ? 'filled' : 'light'} color={color} disabled={disabled} aria-label={label} aria-pressed={active} onClick={onClick}>
        {children}
      </ActionIcon>
    </Tooltip>
  );
}

/** Ink colour swatches and the stroke width for new shapes (and the selected one). */
function StylePicker({ style, onStyle }: Pick<Props, 'style' | 'onStyle'>) {
  return (
    <>
      <Group gap={4}>
        {PALETTE_COLOURS.map((c) => (
          <ActionIcon
            key={c}
            size={44}
            radius="xl"
            aria-label={`Colour ${c}`}
            aria-pressed={style.colour === c}
            onClick={() => onStyle({ ...style, colour: c })}
            style={{
              background: PALETTE[c].ink,
              border: `${style.colour === c ? 5 : 3}px solid ${PALETTE[c].outline}`,
              outline: style.colour === c ? '3px solid #fff' : undefined,
            }}
          />
        ))}
      </Group>
      <SegmentedControl
        size="md"
        value={style.width}
        onChange={(w) => onStyle({ ...style, width: w })}
        data={STROKE_WIDTH_NAMES.map((w) => ({ value: w, label: w }))}
        aria-label="Stroke width"
      />
    </>
  );
}

/** Big targets (48 px) for a finger or a stylus at the workstand; shortcuts in the tooltips. */
export function AnnotateToolbar(p: Props) {
  return (
    <Group gap={6} p={6} wrap="wrap" bg="dark.7" data-testid="annotate-toolbar">
      {(Object.keys(TOOL_ICONS) as Tool[]).map((t) => {
        const [node, name, key] = TOOL_ICONS[t];
        const label = `${name} (${key})`;
        return (
          <ToolButton key={label} label={label} onClick={() => p.onTool(t)} active={p.tool === t}>
            {node}
          </ToolButton>
        );
      })}
      <ToolButton label="Undo (Ctrl+Z)" onClick={p.onUndo} disabled={!p.canUndo}>
        <IconArrowBackUp />
      </ToolButton>
      <ToolButton label="Redo (Ctrl+Shift+Z)" onClick={p.onRedo} disabled={!p.canRedo}>
        <IconArrowForwardUp />
      </ToolButton>
      <ToolButton label="Delete (Del)" onClick={() => p.onDelete?.()} disabled={!p.onDelete} color="red">
        <IconTrash />
      </ToolButton>
      <ToolButton label="Zoom in (+)" onClick={p.onZoomIn}>
        <IconZoomIn />
      </ToolButton>
      <ToolButton label="Zoom out (−)" onClick={p.onZoomOut}>
        <IconZoomOut />
      </ToolButton>
      <StylePicker style={p.style} onStyle={p.onStyle} />
    </Group>
  );
}
