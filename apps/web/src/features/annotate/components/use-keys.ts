import { useWindowEvent } from '@mantine/hooks';
import type { Tool } from '../model/edit';
import { TOOL_KEYS } from './annotate-toolbar';

interface Keys {
  undo: () => void;
  redo: () => void;
  remove: () => void;
  deselect: () => void;
  tool: (t: Tool) => void;
  zoomIn: () => void;
  zoomOut: () => void;
}

/** Desktop shortcuts; ignored while typing in a field. */
export function useEditorKeys(k: Keys, enabled: boolean): void {
  useWindowEvent('keydown', (e) => {
    const target = e.target as HTMLElement | null;
    if (!enabled || target?.closest('input, textarea, [contenteditable]')) return;
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key.toLowerCase();
    if (mod && key === 'z') (e.shiftKey ? k.redo : k.undo)();
    else if (mod && key === 'y') k.redo();
    else if (key === 'delete' || key === 'backspace') k.remove();
    else if (key === 'escape') k.deselect();
    else if (key === '+' || key === '=') k.zoomIn();
    else if (key === '-') k.zoomOut();
    else if (!mod && TOOL_KEYS[key]) k.tool(TOOL_KEYS[key]);
    else return;
    e.preventDefault();
  });
}
