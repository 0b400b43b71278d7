import {
  arrowHead,
  arrowShaftEnd,
  type captionLayout,
  endTicks,
  fontPx,
  outlinePx,
  PALETTE,
  placeCaption,
  strokePx,
  toPixel,
  type CaptionRect,
  type Point,
  type Shape,
  type Size,
} from '@benchproof/annotation';
import type Konva from 'konva';
import { Ellipse, Group, Image as KImage, Line, Rect, Text } from 'react-konva';
import { useEffect, useRef } from 'react';
import KonvaLib from 'konva';

const flat = (pts: Point[]) => pts.flatMap((p) => [p.x, p.y]);
const ROUND = { lineCap: 'round', lineJoin: 'round' } as const;

/** The same geometry as the lib's SVG renderer (marks.ts), drawn with Konva: outline first, ink on top. */
function Twice({ shape, size, points, dash, closed }: { shape: Shape; size: Size; points: Point[]; dash?: number[]; closed?: boolean }) {
  const c = PALETTE[shape.colour];
  return (
    <>
      <Line points={flat(points)} stroke={c.outline} strokeWidth={outlinePx(shape.width, size)} dash={dash} closed={closed} {...ROUND} />
      <Line points={flat(points)} stroke={c.ink} strokeWidth={strokePx(shape.width, size)} dash={dash} closed={closed} {...ROUND} />
    </>
  );
}

type Captions = ReturnType<typeof captionLayout>;

/** A caption in its laid-out box (inside the photo, clear of the others), as the SVG renderer draws it. */
function Caption({ text, box, shape, size }: { text: string; box: CaptionRect; shape: Shape; size: Size }) {
  const font = fontPx(size);
  const c = PALETTE[shape.colour];
  return (
    <>
      <Rect x={box.x} y={box.y} width={box.width} height={box.height} cornerRadius={font * 0.25} fill={c.ink} stroke={c.outline} strokeWidth={font * 0.08} />
      <Text
        x={box.x}
        y={box.y}
        width={box.width}
        height={box.height}
        align="center"
        verticalAlign="middle"
        text={text}
        fontSize={font}
        fontStyle="600"
        fontFamily="Inter, DejaVu Sans, sans-serif"
        fill={c.outline}
      />
    </>
  );
}

function LineMark({ shape, size, captions }: { shape: Shape & { from: Point; to: Point }; size: Size; captions: Captions }) {
  const a = toPixel(shape.from, size);
  const b = toPixel(shape.to, size);
  const w = strokePx(shape.width, size);
  const cap = captions.get(shape.id);
  return (
    <>
      <Twice shape={shape} size={size} points={[a, b]} dash={shape.kind === 'scale' ? [3 * w, 2 * w] : undefined} />
      {endTicks(a, b, w).map((t, i) => (
        <Twice key={i} shape={shape} size={size} points={t} />
      ))}
      {cap && <Caption text={cap.text} box={cap.box} shape={shape} size={size} />}
    </>
  );
}

/** A redaction box: the photo's own pixels, pixelated, as the server does. */
function BlurNode({ shape, size, image }: { shape: Shape & { kind: 'blur' }; size: Size; image: HTMLImageElement }) {
  const ref = useRef<Konva.Image>(null);
  const tl = toPixel(shape.topLeft, size);
  const br = toPixel(shape.bottomRight, size);
  const w = Math.max(1, br.x - tl.x);
  const h = Math.max(1, br.y - tl.y);
  const block = Math.max(8, Math.round(Math.max(size.width, size.height) / 60));
  useEffect(() => {
    ref.current?.cache();
  }, [tl.x, tl.y, w, h]);
  const sx = image.naturalWidth / size.width;
  return (
    <KImage
      ref={ref}
      image={image}
      x={tl.x}
      y={tl.y}
      width={w}
      height={h}
      crop={{ x: tl.x * sx, y: tl.y * sx, width: w * sx, height: h * sx }}
      filters={[KonvaLib.Filters.Pixelate]}
      pixelSize={block}
    />
  );
}

interface NodeProps {
  shape: Shape;
  size: Size;
  image: HTMLImageElement;
  /** The document's caption layout (marks.ts), shared by every node. */
  captions: Captions;
}

export function ShapeNode({ shape, size, image, captions }: NodeProps) {
  switch (shape.kind) {
    case 'ring': {
      const c = toPixel(shape.centre, size);
      const p = PALETTE[shape.colour];
      const r = { x: c.x, y: c.y, radiusX: shape.rx * size.width, radiusY: shape.ry * size.height };
      return (
        <Group>
          <Ellipse {...r} stroke={p.outline} strokeWidth={outlinePx(shape.width, size)} />
          <Ellipse {...r} stroke={p.ink} strokeWidth={strokePx(shape.width, size)} />
        </Group>
      );
    }
    case 'arrow': {
      const a = toPixel(shape.from, size);
      const b = toPixel(shape.to, size);
      const w = strokePx(shape.width, size);
      const p = PALETTE[shape.colour];
      return (
        <Group>
          <Twice shape={shape} size={size} points={[a, arrowShaftEnd(a, b, w)]} />
          <Line points={flat(arrowHead(a, b, w))} closed fill={p.ink} stroke={p.outline} strokeWidth={outlinePx(shape.width, size) - w} {...ROUND} />
        </Group>
      );
    }
    case 'pen':
      return (
        <Group>
          <Twice shape={shape} size={size} points={shape.points.map((pt) => toPixel(pt, size))} />
        </Group>
      );
    case 'label':
      return (
        <Group>
          <Caption text={shape.text} box={captions.get(shape.id)?.box ?? placeCaption(shape.text, toPixel(shape.at, size), size)} shape={shape} size={size} />
        </Group>
      );
    case 'ruler':
    case 'scale':
      return (
        <Group>
          <LineMark shape={shape} size={size} captions={captions} />
        </Group>
      );
    case 'blur':
      return <BlurNode shape={shape} size={size} image={image} />;
  }
}
