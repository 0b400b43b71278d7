import type Konva from 'konva';
import { useCallback, useRef, useState } from 'react';

export interface View {
  zoom: number;
  x: number;
  y: number;
}

const MIN_ZOOM = 1;
const MAX_ZOOM = 8;

/**
 * Zoom and pan of the stage: wheel zooms at the pointer, two fingers pinch and pan,
 * keys zoom at the centre. The fitted image is zoom 1; it never shrinks below that.
 */
export function useView(fit: number, box: { width: number; height: number }, image: { width: number; height: number }) {
  const [view, setView] = useState<View>({ zoom: 1, x: 0, y: 0 });
  const pinch = useRef<{ dist: number; centre: { x: number; y: number }; view: View } | null>(null);
  const scale = fit * view.zoom;
  // Centre the fitted image when it is smaller than the box.
  const offset = { x: (box.width - image.width * fit) / 2, y: (box.height - image.height * fit) / 2 };

  const zoomAt = useCallback(
    (factor: number, at: { x: number; y: number }) =>
      setView((v) => {
        const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, v.zoom * factor));
        const k = zoom / v.zoom;
        return zoom === 1 ? { zoom: 1, x: 0, y: 0 } : { zoom, x: at.x - offset.x - (at.x - offset.x - v.x) * k, y: at.y - offset.y - (at.y - offset.y - v.y) * k };
      }),
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
    const rect = e.target.getStage()?.container().getBoundingClientRect();
    const centre = { x: (t[0].clientX + t[1].clientX) / 2 - (rect?.left ?? 0), y: (t[0].clientY + t[1].clientY) / 2 - (rect?.top ?? 0) };
    const dist = Math.hypot(t[0].clientX - t[1].clientX, t[0].clientY - t[1].clientY);
    if (!pinch.current) {
      pinch.current = { dist, centre, view };
      return true;
    }
    const start = pinch.current;
    const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, start.view.zoom * (dist / start.dist)));
    const k = zoom / start.view.zoom;
    setView({
      zoom,
      x: centre.x - offset.x - (start.centre.x - offset.x - start.view.x) * k,
      y: centre.y - offset.y - (start.centre.y - offset.y - start.view.y) * k,
    });
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
    reset: () => setView({ zoom: 1, x: 0, y: 0 }),
  };
}
