import type { MediaAssetDto, PairCrop, ShotPairDto } from '@benchproof/contracts';
import type { ShotPairRow } from './pairs.repository';

export function cropOf(row: ShotPairRow): PairCrop | null {
  if (row.cropX === null || row.cropY === null || row.cropW === null || row.cropH === null) return null;
  return { x: row.cropX, y: row.cropY, w: row.cropW, h: row.cropH };
}

export function cropColumns(crop: PairCrop | null): Pick<ShotPairRow, 'cropX' | 'cropY' | 'cropW' | 'cropH'> {
  return { cropX: crop?.x ?? null, cropY: crop?.y ?? null, cropW: crop?.w ?? null, cropH: crop?.h ?? null };
}

export function toPairDto(row: ShotPairRow, before: MediaAssetDto, after: MediaAssetDto): ShotPairDto {
  return {
    id: row.id,
    jobId: row.jobId,
    position: row.position,
    caption: row.caption,
    crop: cropOf(row),
    before,
    after,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
