import { captionLayout, toPixel, type AnnotationDocument, type Shape } from '@benchproof/annotation';
import type Konva from 'konva';
import type { RefObject } from 'react';
import { Circle, Image as KImage, Layer, Stage } from 'react-konva';
import { handlesOf, type Style, type Tool } from '../model/edit';
import { TARGET_PX } from './canvas-gestures';
import { ShapeNode } from './shape-node';
import { useCanvasGestures } from './use-canvas-gestures';
import type { useView } from './use-view';

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

interface HandlesProps {
  shape: Shape;
  size: AnnotationDocument['image'];
  /** The stage scale: handles keep the same size on screen at any zoom. */
  scale: number;
  onHandleDown: ReturnType<typeof useCanvasGestures>['handleDown'];
}

/** Grab handles of the selected shape, each a finger-sized target. */
function SelectionHandles({ shape, size, scale, onHandleDown }: HandlesProps) {
  return handlesOf(shape).map((h, i) => {
    const p = toPixel(h, size);
    return (
      <Circle
        key={i}
        x={p.x}
        y={p.y}
        radius={TARGET_PX / scale}
        fill="rgba(255,255,255,0.35)"
        stroke="#141414"
        strokeWidth={2 / scale}
        onPointerDown={onHandleDown(i)}
      />
    );
  });
}

/** The drawing surface: the photo, the shapes, a live draft and the selected shape's handles. */
export function AnnotateCanvas({ doc, image, box, view, tool, style, selectedId, onSelect, onCommit, stageRef }: Props) {
  const size = doc.image;
  const { shapes, selected, down, move, up, handleDown, cancel } = useCanvasGestures({ doc, view, tool, style, selectedId, onSelect, onCommit, stageRef });
  const captions = captionLayout({ ...doc, shapes }, size);

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
        if (view.onTouchMove(e)) cancel();
      }}
      style={{ touchAction: 'none', cursor: tool === 'select' ? 'default' : 'crosshair' }}
    >
      <Layer name="photo">
        <KImage image={image} width={size.width} height={size.height} />
        {shapes.map((s) => (
          <ShapeNode key={s.id} shape={s} size={size} image={image} captions={captions} />
        ))}
      </Layer>
      <Layer name="handles">
        {tool === 'select' && selected && <SelectionHandles shape={selected} size={size} scale={view.scale} onHandleDown={handleDown} />}
      </Layer>
    </Stage>
  );
}
