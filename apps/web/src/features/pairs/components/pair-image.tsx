import type { MediaAssetDto } from '@benchproof/contracts';
import { useState, type CSSProperties } from 'react';

/**
 * Where a paired shot's picture comes from, best first. The annotated render (rings and
 * rulers burned in, blur boxes applied) is what the owner will see; until the server
 * serves it for this shot, the plain upright derivative stands in. The one place to
 * change when the annotated route settles.
 */
export function pairImageSources(asset: Pick<MediaAssetDto, 'id'>, size: 'screen' | 'print' = 'screen'): string[] {
  return [`/api/media/${asset.id}/annotated/${size}`, `/api/media/${asset.id}/${size}`];
}

/** An <img> that walks pairImageSources until one loads. */
export function PairImage({ asset, alt, style, className }: { asset: MediaAssetDto; alt: string; style?: CSSProperties; className?: string }) {
  const sources = pairImageSources(asset);
  const [index, setIndex] = useState(0);
  return (
    <img
      src={sources[index]}
      alt={alt}
      draggable={false}
      className={className}
      style={style}
      onError={() => setIndex((i) => Math.min(i + 1, sources.length - 1))}
    />
  );
}
