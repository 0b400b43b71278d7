import { hitTest, toNormal, toPixel, type AnnotationDocument, type Point, type Shape } from '@benchproof/annotation';
import type Konva from 'konva';
import { useRef, useState, type RefObject } from 'react';
import { newId } from '../model/history';
import { draftShape, isMeaningful, type Style, type Tool } from '../model/edit';
import { draftAfterMove, panStep, TARGET_PX, withDraft, type Gesture } from './canvas-gestures';
import type { useView } from './use-view';

type PointerEvt = Konva.KonvaEventObject<PointerEvent>;

export interface GestureInput {
  doc: AnnotationDocument;
  view: ReturnType<typeof useView>;
  tool: Tool;
  style: Style;
  selectedId: string | null;
  onSelect: (id: string | null) => void;
  onCommit: (shape: Shape) => void;
  stageRef: RefObject<Konva.Stage | null>;
}

/** The pointer on the photo in normalised coordinates, or null when it is off the stage. */
function stagePointer(stageRef: RefObject<Konva.Stage | null>, size: { width: number; height: number }): Point | null {
  const p = stageRef.current?.getRelativePointerPosition();
  return p ? toNormal(p, size) : null;
}

/**
 * One pointer gesture at a time on the stage: draw with a drawing tool; with select, move the
 * shape under the finger or pan the zoomed photo; drag a handle of the selected shape.
 */
export function useCanvasGestures({ doc, view, tool, style, selectedId, onSelect, onCommit, stageRef }: GestureInput) {
  const size = doc.image;
  const aspect = size.width / size.height;
  const [draft, setDraft] = useState<Shape | null>(null);
  const gesture = useRef<Gesture | null>(null);
  const pointer = () => stagePointer(stageRef, size);
  const shapes = withDraft(doc.shapes, draft);
  const selected = shapes.find((s) => s.id === selectedId) ?? null;

  const down = (e: PointerEvt) => {
    if (gesture.current || !e.evt.isPrimary) return;
    const p = pointer();
    if (!p) return;
    if (tool !== 'select') {
      gesture.current = { kind: 'draw', start: p, pen: [p] };
      setDraft(draftShape(tool, newId(), p, p, style, aspect, []));
      return;
    }
    const hit = hitTest(doc, toPixel(p, size), size, TARGET_PX / view.scale);
    onSelect(hit?.id ?? null);
    gesture.current = hit ? { kind: 'move', start: p, original: hit } : { kind: 'pan', last: { x: e.evt.clientX, y: e.evt.clientY } };
  };

  const move = (e: PointerEvt) => {
    const g = gesture.current;
    const p = pointer();
    if (!g || !p) return;
    if (g.kind === 'pan') return panStep(g, e.evt, view.panBy);
    const next = draftAfterMove(g, p, draft, tool, style, aspect);
    if (next) setDraft(next);
  };

  const up = () => {
    const g = gesture.current;
    gesture.current = null;
    if (draft && g && g.kind !== 'pan' && isMeaningful(draft)) {
      onCommit(draft);
      if (g.kind === 'draw') onSelect(draft.id);
    }
    setDraft(null);
  };

  const handleDown = (index: number) => (e: PointerEvt) => {
    e.cancelBubble = true;
    if (selected) gesture.current = { kind: 'handle', index, original: selected };
  };

  /** A second finger turned the gesture into a pinch: drop whatever was in progress. */
  const cancel = () => {
    gesture.current = null;
    setDraft(null);
  };

  return { shapes, selected, down, move, up, handleDown, cancel };
}
