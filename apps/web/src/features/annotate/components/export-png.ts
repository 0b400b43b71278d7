import type Konva from 'konva';
import type { useView } from './use-view';

/** The editor's own picture at the photo's pixel size (what the server burns in), as a PNG download. */
export function exportStagePng(stage: Konva.Stage | null, view: ReturnType<typeof useView>, size: { width: number; height: number }, mediaId: number): void {
  if (!stage) return;
  const handles = stage.findOne('.handles');
  handles?.hide();
  const src = stage.toCanvas({
    x: view.position.x,
    y: view.position.y,
    width: size.width * view.scale,
    height: size.height * view.scale,
    pixelRatio: 1 / view.scale,
  });
  handles?.show();
  // Rounding in the pixel ratio can lose a row; draw into a canvas of exactly the photo's size.
  const out = document.createElement('canvas');
  out.width = size.width;
  out.height = size.height;
  out.getContext('2d')?.drawImage(src, 0, 0, out.width, out.height);
  const url = out.toDataURL('image/png');
  const a = document.createElement('a');
  a.href = url;
  a.download = `annotated-${mediaId}.png`;
  a.click();
}
