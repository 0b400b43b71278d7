import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';

const KEY_STEPS: Record<string, (p: number) => number> = {
  ArrowLeft: (p) => p - 2,
  ArrowRight: (p) => p + 2,
  PageDown: (p) => p - 20,
  PageUp: (p) => p + 20,
  Home: () => 0,
  End: () => 100,
};

const clamp = (p: number) => Math.max(0, Math.min(100, p));

/**
 * The divider's position in percent of the box's width, moved by dragging anywhere on the box
 * (pointer capture keeps the drag when the finger leaves it) or by keys on the knob.
 */
export function useDivider() {
  const [pos, setPos] = useState(50);
  const box = useRef<HTMLDivElement>(null);
  const dragging = useRef(false);

  const moveTo = (clientX: number) => {
    const r = box.current?.getBoundingClientRect();
    if (r && r.width > 0) setPos(clamp(((clientX - r.left) / r.width) * 100));
  };
  const onDown = (e: PointerEvent<HTMLDivElement>) => {
    dragging.current = true;
    e.currentTarget.setPointerCapture(e.pointerId);
    moveTo(e.clientX);
  };
  const onMove = (e: PointerEvent<HTMLDivElement>) => dragging.current && moveTo(e.clientX);
  const onUp = () => (dragging.current = false);
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = KEY_STEPS[e.key];
    if (!step) return;
    e.preventDefault();
    setPos((p) => clamp(step(p)));
  };

  return { pos, box, onDown, onMove, onUp, onKey };
}
