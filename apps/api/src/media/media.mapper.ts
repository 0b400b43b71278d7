import type { MediaAssetDto, MediaVariant } from '@benchproof/contracts';
import type { MediaAssetRow, MediaDerivativeRow } from './media.repository';

const url = (id: number, variant: MediaVariant | 'original') => `/api/media/${id}/${variant}`;

/** The contracts shape of an asset; file URLs are the session-guarded routes, never storage paths. */
export function toMediaDto(row: MediaAssetRow, derivatives: MediaDerivativeRow[]): MediaAssetDto {
  const has = (v: MediaVariant) => (derivatives.some((d) => d.assetId === row.id && d.variant === v) ? url(row.id, v) : null);
  return {
    id: row.id,
    jobId: row.jobId,
    kind: row.kind,
    phase: row.phase,
    area: row.area,
    source: row.source,
    caption: row.caption,
    status: row.derivativeStatus,
    derivativeError: row.derivativeError,
    width: row.width,
    height: row.height,
    durationMs: row.durationMs,
    capturedAt: row.capturedAt?.toISOString() ?? null,
    uploadedAt: row.uploadedAt.toISOString(),
    uploadedBy: row.uploadedBy,
    sha256: row.sha256,
    byteSize: row.byteSize,
    mime: row.mime,
    sourceAssetId: row.sourceAssetId,
    timecodeMs: row.timecodeMs,
    deletedAt: row.deletedAt?.toISOString() ?? null,
    urls: { original: url(row.id, 'original'), thumb: has('thumb'), screen: has('screen'), print: has('print'), poster: has('poster') },
  };
}
