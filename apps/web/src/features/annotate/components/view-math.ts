export interface View {
  zoom: number;
  x: number;
  y: number;
}

type Xy = { x: number; y: number };

export const MIN_ZOOM = 1;
export const MAX_ZOOM = 8;
/** The fitted, unpanned view. */
export const home = (): View => ({ zoom: 1, x: 0, y: 0 });

const clampZoom = (zoom: number) => Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, zoom));

/** The view zoomed by `factor` keeping the screen point `at` still; back at zoom 1 it recentres. */
export function zoomAround(v: View, factor: number, at: Xy, offset: Xy): View {
  const zoom = clampZoom(v.zoom * factor);
  const k = zoom / v.zoom;
  return zoom === 1 ? home() : { zoom, x: at.x - offset.x - (at.x - offset.x - v.x) * k, y: at.y - offset.y - (at.y - offset.y - v.y) * k };
}

export interface PinchStart {
  dist: number;
  centre: Xy;
  view: View;
}

/** The view for a pinch that began at `start` and now has its fingers `dist` apart around `centre`. */
export function pinchView(start: PinchStart, dist: number, centre: Xy, offset: Xy): View {
  const zoom = clampZoom(start.view.zoom * (dist / start.dist));
  const k = zoom / start.view.zoom;
  return {
    zoom,
    x: centre.x - offset.x - (start.centre.x - offset.x - start.view.x) * k,
    y: centre.y - offset.y - (start.centre.y - offset.y - start.view.y) * k,
  };
}

/** Midpoint (relative to the stage's box) and distance of two touches. */
export function twoFingers(t: TouchList, rect: { left: number; top: number } | undefined): { centre: Xy; dist: number } {
  const centre = { x: (t[0].clientX + t[1].clientX) / 2 - (rect?.left ?? 0), y: (t[0].clientY + t[1].clientY) / 2 - (rect?.top ?? 0) };
  const dist = Math.hypot(t[0].clientX - t[1].clientX, t[0].clientY - t[1].clientY);
  return { centre, dist };
}
