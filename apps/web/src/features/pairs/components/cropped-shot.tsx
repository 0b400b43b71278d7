import type { MediaAssetDto, PairCrop } from '@benchproof/contracts';
import { useState, type CSSProperties } from 'react';
import { PairImage } from './pair-image';

const WHOLE: PairCrop = { x: 0, y: 0, w: 1, h: 1 };

/** Image placement that shows only the crop rectangle, filling its box. */
export function cropStyle(crop: PairCrop | null): CSSProperties {
  const c = crop ?? WHOLE;
  return {
    position: 'absolute',
    width: `${100 / c.w}%`,
    height: `${100 / c.h}%`,
    left: `${(-c.x / c.w) * 100}%`,
    top: `${(-c.y / c.h) * 100}%`,
    maxWidth: 'none',
    userSelect: 'none',
    pointerEvents: 'none',
  };
}

/** Aspect ratio of the cropped region, from the upright picture's own size once it loads. */
export function useCropAspect(crop: PairCrop | null): [number, (img: HTMLImageElement) => void] {
  const [natural, setNatural] = useState(3 / 2);
  const c = crop ?? WHOLE;
  return [(natural * c.w) / c.h, (img) => img.naturalHeight && setNatural(img.naturalWidth / img.naturalHeight)];
}

/** One shot showing only the shared crop. */
export function CroppedShot({ asset, crop, alt }: { asset: MediaAssetDto; crop: PairCrop | null; alt: string }) {
  const [aspect, measure] = useCropAspect(crop);
  return (
    <div
      style={{ position: 'relative', overflow: 'hidden', aspectRatio: String(aspect), borderRadius: 8, background: '#111' }}
      onLoadCapture={(e) => measure(e.target as HTMLImageElement)}
    >
      <PairImage asset={asset} alt={alt} style={cropStyle(crop)} />
    </div>
  );
}
