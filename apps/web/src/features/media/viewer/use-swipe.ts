import { useRef, type PointerEvent } from 'react';

/** Horizontal travel (px) that counts as a swipe rather than a tap. */
const SWIPE_PX = 50;

/** Swipe left/right with pointer events (touch, pen or a dragged mouse); no gesture library. */
export function useSwipe(onPrev: () => void, onNext: () => void) {
  const start = useRef<{ x: number; y: number } | null>(null);
  return {
    onPointerDown: (e: PointerEvent) => {
      start.current = { x: e.clientX, y: e.clientY };
    },
    onPointerUp: (e: PointerEvent) => {
      const s = start.current;
      start.current = null;
      if (!s) return;
      const dx = e.clientX - s.x;
      if (Math.abs(dx) < SWIPE_PX || Math.abs(dx) < Math.abs(e.clientY - s.y)) return;
      if (dx < 0) onNext();
      else onPrev();
    },
    onPointerCancel: () => {
      start.current = null;
    },
    style: { touchAction: 'pan-y' as const },
  };
}
