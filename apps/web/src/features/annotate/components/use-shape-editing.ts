import { compactShape, keepLabelInside, type Shape, type Size } from '@benchproof/annotation';
import { useState } from 'react';
import type { Style, Tool } from '../model/edit';
import { useEditorKeys } from './use-keys';
import { useShapeHistory } from './use-shape-history';

/**
 * The editor's working session over the shape history: the chosen tool and style, the selection,
 * a new scale or label waiting for its length or text, and the keyboard shortcuts.
 * Returns what the toolbar and the canvas take as props.
 */
export function useShapeEditing(initial: Shape[], image: Size, zoom: { zoomIn: () => void; zoomOut: () => void }) {
  const history = useShapeHistory(initial);
  // Every kept shape is on the stored grid, strokes simplified and labels inside the photo,
  // so what is on screen is exactly what the save sends and the server keeps.
  const put = (s: Shape) => history.put(compactShape(keepLabelInside(s, image), image));
  const [tool, setTool] = useState<Tool>('select');
  const [style, setStyle] = useState<Style>({ colour: 'amber', width: 'medium' });
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [asking, setAsking] = useState<Shape | null>(null);
  const selected = history.shapes.find((s) => s.id === selectedId) ?? null;

  const remove = () => {
    if (!selectedId) return;
    history.remove(selectedId);
    setSelectedId(null);
  };
  // A new scale needs its known length and a new label its text before either becomes an edit.
  const onCommit = (s: Shape) => {
    const isNew = !history.shapes.some((x) => x.id === s.id);
    if (isNew && (s.kind === 'scale' || s.kind === 'label')) setAsking(s);
    else put(s);
  };
  const deselect = () => setSelectedId(null);
  useEditorKeys({ undo: history.undo, redo: history.redo, remove, deselect, tool: setTool, zoomIn: zoom.zoomIn, zoomOut: zoom.zoomOut }, asking === null);

  // Unlike the shortcut keys, picking a drawing tool on the toolbar also drops the selection.
  const chooseTool = (t: Tool) => {
    setTool(t);
    if (t !== 'select') deselect();
  };
  // A new style applies to the selected shape too.
  const chooseStyle = (s: Style) => {
    setStyle(s);
    if (selected) put({ ...selected, ...s });
  };

  const toolbar = {
    tool,
    onTool: chooseTool,
    style,
    onStyle: chooseStyle,
    canUndo: history.canUndo,
    canRedo: history.canRedo,
    onUndo: history.undo,
    onRedo: history.redo,
    onDelete: selected ? remove : null,
    onZoomIn: zoom.zoomIn,
    onZoomOut: zoom.zoomOut,
  };
  const canvas = { tool, style, selectedId, onSelect: setSelectedId, onCommit };
  const saved = { dirty: history.dirty, markSaved: history.markSaved };
  return { shapes: history.shapes, selected, put, saved, asking, closeAsking: () => setAsking(null), toolbar, canvas };
}
