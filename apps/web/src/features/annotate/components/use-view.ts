import type Konva from 'konva';
import { useCallback, useRef, useState } from 'react';
import { home, pinchView, twoFingers, zoomAround, type PinchStart, type View } from './view-math';

export type { View } from './view-math';

/**
 * Zoom and pan of the stage: wheel zooms at the pointer, two fingers pinch and pan,
 * keys zoom at the centre. The fitted image is zoom 1; it never shrinks below that.
 */
export function useView(fit: number, box: { width: number; height: number }, image: { width: number; height: number }) {
  const [view, setView] = useState<View>(home);
  const pinch = useRef<PinchStart | null>(null);
  const scale = fit * view.zoom;
  // Centre the fitted image when it is smaller than the box.
  const offset = { x: (box.width - image.width * fit) / 2, y: (box.height - image.height * fit) / 2 };

  const zoomAt = useCallback(
    (factor: number, at: { x: number; y: number }) => setView((v) => zoomAround(v, factor, at, { x: offset.x, y: offset.y })),
    [offset.x, offset.y],
  );

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const p = e.target.getStage()?.getPointerPosition();
    if (p) zoomAt(e.evt.deltaY < 0 ? 1.15 : 1 / 1.15, p);
  };

  /** Returns true while two fingers are down (the caller then stops drawing). */
  const onTouchMove = (e: Konva.KonvaEventObject<TouchEvent>): boolean => {
    const t = e.evt.touches;
    if (t.length !== 2) {
      pinch.current = null;
      return false;
    }
    e.evt.preventDefault();
    const { centre, dist } = twoFingers(t, e.target.getStage()?.container().getBoundingClientRect());
    if (pinch.current) setView(pinchView(pinch.current, dist, centre, offset));
    else pinch.current = { dist, centre, view };
    return true;
  };

  const panBy = (dx: number, dy: number) => setView((v) => (v.zoom === 1 ? v : { ...v, x: v.x + dx, y: v.y + dy }));
  const centre = { x: box.width / 2, y: box.height / 2 };
  return {
    scale,
    position: { x: offset.x + view.x, y: offset.y + view.y },
    zoom: view.zoom,
    onWheel,
    onTouchMove,
    panBy,
    zoomIn: () => zoomAt(1.25, centre),
    zoomOut: () => zoomAt(1 / 1.25, centre),
    reset: () => setView(home()),
  };
}
