import type { MediaAssetDto } from '@benchproof/contracts';
import { useWindowEvent } from '@mantine/hooks';

/** Which shot the viewer shows, stepping round the list either way; the arrow keys step too while it is open. */
export function useViewerNav(assets: MediaAssetDto[], index: number | null, onIndex: (i: number | null) => void) {
  const count = assets.length;
  const asset = index === null ? undefined : assets[Math.min(index, count - 1)];
  const at = index === null ? 0 : Math.min(index, count - 1);
  const prev = () => count && onIndex((at - 1 + count) % count);
  const next = () => count && onIndex((at + 1) % count);
  useWindowEvent('keydown', (e) => {
    if (index === null) return;
    if (e.key === 'ArrowLeft') prev();
    if (e.key === 'ArrowRight') next();
  });
  return { asset, at, count, prev, next };
}
