import type { MediaAssetDto } from '@benchproof/contracts';
import { isVideoKind } from '@benchproof/domain';
import { Center, Loader, Text } from '@mantine/core';
import type { CSSProperties, ReactNode } from 'react';

/** Draws a still (photo or scope still) in place of the plain screen image, e.g. with its annotations; from app/routes. */
export type RenderStill = (asset: MediaAssetDto & { urls: { screen: string } }) => ReactNode;

/** Fills the stage and letterboxes, whatever the shape of the shot or the screen. */
const FILL: CSSProperties = { position: 'absolute', inset: 0, width: '100%', height: '100%', objectFit: 'contain' };

/** The screen-size image, or the original video streamed with range requests so it can seek. */
export function MediaStage({ asset, renderStill }: { asset: MediaAssetDto; renderStill?: RenderStill }) {
  if (isVideoKind(asset.kind)) {
    return (
      <video
        key={asset.id}
        src={asset.urls.original}
        poster={asset.urls.poster ?? undefined}
        controls
        playsInline
        preload="metadata"
        style={FILL}
        data-testid="viewer-video"
      />
    );
  }
  if (!asset.urls.screen) {
    return (
      <Center c="white" style={{ flexDirection: 'column', gap: 8 }}>
        {asset.status === 'failed' ? <Text c="red.3">{asset.derivativeError ?? 'The screen size could not be made.'}</Text> : <Loader color="white" />}
      </Center>
    );
  }
  const screen = asset.urls.screen;
  if (renderStill && (asset.kind === 'photo' || asset.kind === 'scope_still')) return renderStill({ ...asset, urls: { ...asset.urls, screen } });
  return <img key={asset.id} src={screen} alt={asset.caption || `Shot ${asset.id}`} draggable={false} data-testid="viewer-image" style={FILL} />;
}
