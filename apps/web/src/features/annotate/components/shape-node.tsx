import {
  arrowHead,
  arrowShaftEnd,
  captionAnchor,
  captionBox,
  captionOf,
  endTicks,
  fontPx,
  outlinePx,
  PALETTE,
  strokePx,
  toPixel,
  type AnnotationDocument,
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

function Caption({ text, at, shape, size }: { text: string; at: Point; shape: Shape; size: Size }) {
  const font = fontPx(size);
  const box = captionBox(text, font);
  const c = PALETTE[shape.colour];
  return (
    <>
      <Rect
        x={at.x - box.width / 2}
        y={at.y - box.height / 2}
        width={box.width}
        height={box.height}
        cornerRadius={font * 0.25}
        fill={c.ink}
        stroke={c.outline}
        strokeWidth={font * 0.08}
      />
      <Text
        x={at.x - box.width / 2}
        y={at.y - box.height / 2}
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

function LineMark({ doc, shape, size }: { doc: AnnotationDocument; shape: Shape & { from: Point; to: Point }; size: Size }) {
  const a = toPixel(shape.from, size);
  const b = toPixel(shape.to, size);
  const w = strokePx(shape.width, size);
  const text = captionOf(doc, shape);
  return (
    <>
      <Twice shape={shape} size={size} points={[a, b]} dash={shape.kind === 'scale' ? [3 * w, 2 * w] : undefined} />
      {endTicks(a, b, w).map((t, i) => (
        <Twice key={i} shape={shape} size={size} points={t} />
      ))}
      {text && <Caption text={text} at={captionAnchor(a, b, fontPx(size))} shape={shape} size={size} />}
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

export function ShapeNode({ doc, shape, size, image }: { doc: AnnotationDocument; shape: Shape; size: Size; image: HTMLImageElement }) {
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
          <Caption text={shape.text} at={toPixel(shape.at, size)} shape={shape} size={size} />
        </Group>
      );
    case 'ruler':
    case 'scale':
      return (
        <Group>
          <LineMark doc={doc} shape={shape} size={size} />
        </Group>
      );
    case 'blur':
      return <BlurNode shape={shape} size={size} image={image} />;
  }
}
