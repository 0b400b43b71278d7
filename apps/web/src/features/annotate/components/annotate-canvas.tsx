import { hitTest, toNormal, toPixel, translateShape, type AnnotationDocument, type Point, type Shape } from '@benchproof/annotation';
import type Konva from 'konva';
import { useRef, useState, type RefObject } from 'react';
import { Circle, Image as KImage, Layer, Stage } from 'react-konva';
import { newId } from '../model/history';
import { draftShape, dragHandle, handlesOf, isMeaningful, type Style, type Tool } from '../model/edit';
import { ShapeNode } from './shape-node';
import type { useView } from './use-view';

/** Finger-sized: a 22 px radius is a 44 px target on screen whatever the zoom. */
const TARGET_PX = 22;

type Gesture =
  | { kind: 'draw'; start: Point; pen: Point[] }
  | { kind: 'move'; start: Point; original: Shape }
  | { kind: 'handle'; index: number; original: Shape }
  | { kind: 'pan'; last: { x: number; y: number } };

interface Props {
  doc: AnnotationDocument;
  image: HTMLImageElement;
  box: { width: number; height: number };
  view: ReturnType<typeof useView>;
  tool: Tool;
  style: Style;
  selectedId: string | null;
  onSelect: (id: string | null) => void;
  /** A finished edit: the shape as it now is (new or changed). */
  onCommit: (shape: Shape) => void;
  stageRef: RefObject<Konva.Stage | null>;
}

/** The drawing surface: the photo, the shapes, a live draft and the selected shape's handles. */
export function AnnotateCanvas({ doc, image, box, view, tool, style, selectedId, onSelect, onCommit, stageRef }: Props) {
  const size = doc.image;
  const [draft, setDraft] = useState<Shape | null>(null);
  const gesture = useRef<Gesture | null>(null);
  const pointer = (): Point | null => {
    const p = stageRef.current?.getRelativePointerPosition();
    return p ? toNormal(p, size) : null;
  };
  const shapes = doc.shapes.map((s) => (draft && s.id === draft.id ? draft : s));
  if (draft && !doc.shapes.some((s) => s.id === draft.id)) shapes.push(draft);
  const selected = shapes.find((s) => s.id === selectedId) ?? null;

  const down = (e: Konva.KonvaEventObject<PointerEvent>) => {
    if (gesture.current || !e.evt.isPrimary) return;
    const p = pointer();
    if (!p) return;
    if (tool !== 'select') {
      gesture.current = { kind: 'draw', start: p, pen: [p] };
      setDraft(draftShape(tool, newId(), p, p, style, size.width / size.height, []));
      return;
    }
    const hit = hitTest(doc, toPixel(p, size), size, TARGET_PX / view.scale);
    onSelect(hit?.id ?? null);
    gesture.current = hit ? { kind: 'move', start: p, original: hit } : { kind: 'pan', last: { x: e.evt.clientX, y: e.evt.clientY } };
  };

  const move = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const g = gesture.current;
    const p = pointer();
    if (!g || !p) return;
    if (g.kind === 'pan') {
      view.panBy(e.evt.clientX - g.last.x, e.evt.clientY - g.last.y);
      g.last = { x: e.evt.clientX, y: e.evt.clientY };
    } else if (g.kind === 'draw' && draft && tool !== 'select') {
      if (tool === 'pen') g.pen.push(p);
      setDraft(draftShape(tool, draft.id, g.start, p, style, size.width / size.height, tool === 'pen' ? g.pen.slice(0, -1) : []));
    } else if (g.kind === 'move') {
      setDraft(translateShape(g.original, p.x - g.start.x, p.y - g.start.y));
    } else if (g.kind === 'handle') {
      setDraft(dragHandle(g.original, g.index, p));
    }
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

  const handleDown = (index: number) => (e: Konva.KonvaEventObject<PointerEvent>) => {
    e.cancelBubble = true;
    if (selected) gesture.current = { kind: 'handle', index, original: selected };
  };

  return (
    <Stage
      ref={stageRef}
      width={box.width}
      height={box.height}
      scaleX={view.scale}
      scaleY={view.scale}
      x={view.position.x}
      y={view.position.y}
      onPointerDown={down}
      onPointerMove={move}
      onPointerUp={up}
      onPointerCancel={up}
      onPointerLeave={up}
      onWheel={view.onWheel}
      onTouchMove={(e) => {
        if (view.onTouchMove(e)) {
          gesture.current = null;
          setDraft(null);
        }
      }}
      style={{ touchAction: 'none', cursor: tool === 'select' ? 'default' : 'crosshair' }}
    >
      <Layer name="photo">
        <KImage image={image} width={size.width} height={size.height} />
        {shapes.map((s) => <ShapeNode key={s.id} doc={{ ...doc, shapes }} shape={s} size={size} image={image} />)}
      </Layer>
      <Layer name="handles">
        {tool === 'select' && selected &&
          handlesOf(selected).map((h, i) => {
            const p = toPixel(h, size);
            return <Circle key={i} x={p.x} y={p.y} radius={TARGET_PX / view.scale} fill="rgba(255,255,255,0.35)" stroke="#141414" strokeWidth={2 / view.scale} onPointerDown={handleDown(i)} />;
          })}
      </Layer>
    </Stage>
  );
}
