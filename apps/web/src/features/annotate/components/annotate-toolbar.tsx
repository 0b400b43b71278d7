import { ActionIcon, Tooltip } from '@mantine/core';
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
import classes from './annotate-editor.module.css';
import { StylePicker } from './style-picker';

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
  className?: string;
}

/** One 44 px icon button, named by its tooltip text (which carries the shortcut). */
function ToolButton({ label, onClick, children, active, disabled, color, className }: ToolButtonProps) {
  return (
    <Tooltip label={label} events={{ hover: true, focus: false, touch: false }}>
      <ActionIcon
        size={44}
        variant={active ? 'filled' : 'subtle'}
        color={color ?? 'gray.0'}
        className={className}
        disabled={disabled}
        aria-label={label}
        aria-pressed={active}
        onClick={onClick}
      >
        {children}
      </ActionIcon>
    </Tooltip>
  );
}

/**
 * The one tool bar: the drawing tools in a strip that scrolls sideways on a phone, then undo,
 * redo, delete and one control for colour and width. Zoom buttons show from tablet width
 * (a phone pinches). Every target is at least 44 px.
 */
export function AnnotateToolbar(p: Props) {
  return (
    <div className={classes.toolbar} data-testid="annotate-toolbar">
      <div className={classes.tools} role="group" aria-label="Tools">
        {(Object.keys(TOOL_ICONS) as Tool[]).map((t) => {
          const [node, name, key] = TOOL_ICONS[t];
          const label = `${name} (${key})`;
          return (
            <ToolButton key={label} label={label} onClick={() => p.onTool(t)} active={p.tool === t} color={p.tool === t ? 'blue' : undefined}>
              {node}
            </ToolButton>
          );
        })}
      </div>
      <div className={classes.actions}>
        <ToolButton label="Undo (Ctrl+Z)" onClick={p.onUndo} disabled={!p.canUndo}>
          <IconArrowBackUp />
        </ToolButton>
        <ToolButton label="Redo (Ctrl+Shift+Z)" onClick={p.onRedo} disabled={!p.canRedo}>
          <IconArrowForwardUp />
        </ToolButton>
        {p.onDelete && (
          <ToolButton label="Delete (Del)" onClick={() => p.onDelete?.()} color="red.4">
            <IconTrash />
          </ToolButton>
        )}
        <ToolButton label="Zoom in (+)" onClick={p.onZoomIn} className={classes.wideOnly}>
          <IconZoomIn />
        </ToolButton>
        <ToolButton label="Zoom out (−)" onClick={p.onZoomOut} className={classes.wideOnly}>
          <IconZoomOut />
        </ToolButton>
        <StylePicker style={p.style} onStyle={p.onStyle} />
      </div>
    </div>
  );
}
