import { clamp01, type PaletteColour, type Point, type Shape, type StrokeWidth } from '@benchproof/annotation';

export const TOOLS = ['select', 'ring', 'arrow', 'pen', 'label', 'ruler', 'scale', 'blur'] as const;
export type Tool = (typeof TOOLS)[number];
export type DrawTool = Exclude<Tool, 'select'>;

export interface Style {
  colour: PaletteColour;
  width: StrokeWidth;
}

const clampP = (p: Point): Point => ({ x: clamp01(p.x), y: clamp01(p.y) });

/** A shape being drawn from `start` to `end` (normalised), as the finger moves. */
export function draftShape(tool: DrawTool, id: string, start: Point, end: Point, style: Style, aspect: number, pen: Point[] = []): Shape {
  const a = clampP(start);
  const b = clampP(end);
  switch (tool) {
    case 'ring': {
      // Drawn from the centre outwards; a circle in pixels unless the mechanic drags an ellipse handle later.
      const r = Math.hypot((b.x - a.x) * aspect, b.y - a.y);
      return { id, ...style, kind: 'ring', centre: a, rx: Math.max(0.002, r / aspect), ry: Math.max(0.002, r) };
    }
    case 'arrow':
    case 'ruler':
      return { id, ...style, kind: tool, from: a, to: b };
    case 'scale':
      return { id, ...style, kind: 'scale', from: a, to: b, knownMm: 10 };
    case 'pen':
      return { id, ...style, kind: 'pen', points: [...pen, b] };
    case 'label':
      return { id, ...style, kind: 'label', at: b, text: 'Note' };
    case 'blur':
      return {
        id,
        ...style,
        kind: 'blur',
        topLeft: { x: Math.min(a.x, b.x), y: Math.min(a.y, b.y) },
        bottomRight: { x: Math.max(a.x, b.x), y: Math.max(a.y, b.y) },
      };
  }
}

/** Whether a drawn shape is big enough to keep (a stray tap draws nothing). */
export function isMeaningful(shape: Shape, minNorm = 0.01): boolean {
  switch (shape.kind) {
    case 'ring':
      return shape.ry >= minNorm || shape.rx >= minNorm;
    case 'arrow':
    case 'ruler':
    case 'scale':
      return Math.hypot(shape.to.x - shape.from.x, shape.to.y - shape.from.y) >= minNorm;
    case 'blur':
      return shape.bottomRight.x - shape.topLeft.x >= minNorm && shape.bottomRight.y - shape.topLeft.y >= minNorm;
    case 'pen':
      return shape.points.length > 1;
    case 'label':
      return true;
  }
}

/** Points a finger can drag to resize: line ends, a ring's right and bottom edge, a box's corners. */
export function handlesOf(shape: Shape): Point[] {
  switch (shape.kind) {
    case 'arrow':
    case 'ruler':
    case 'scale':
      return [shape.from, shape.to];
    case 'ring':
      return [
        { x: shape.centre.x + shape.rx, y: shape.centre.y },
        { x: shape.centre.x, y: shape.centre.y + shape.ry },
      ];
    case 'blur':
      return [shape.topLeft, shape.bottomRight];
    case 'pen':
    case 'label':
      return [];
  }
}

/** The shape with handle `i` dragged to `p` (normalised). */
export function dragHandle(shape: Shape, i: number, to: Point): Shape {
  const p = clampP(to);
  switch (shape.kind) {
    case 'arrow':
    case 'ruler':
    case 'scale':
      return i === 0 ? { ...shape, from: p } : { ...shape, to: p };
    case 'ring':
      return i === 0 ? { ...shape, rx: Math.max(0.002, Math.abs(p.x - shape.centre.x)) } : { ...shape, ry: Math.max(0.002, Math.abs(p.y - shape.centre.y)) };
    case 'blur': {
      const [a, b] = i === 0 ? [p, shape.bottomRight] : [shape.topLeft, p];
      return { ...shape, topLeft: { x: Math.min(a.x, b.x), y: Math.min(a.y, b.y) }, bottomRight: { x: Math.max(a.x, b.x), y: Math.max(a.y, b.y) } };
    }
    case 'pen':
    case 'label':
      return shape;
  }
}
