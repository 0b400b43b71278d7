import type { MediaAssetDto } from '@benchproof/contracts';
import { MEDIA_AREAS, MEDIA_PHASES, type MediaArea, type MediaPhase } from '@benchproof/domain';

export interface AreaGroup {
  area: MediaArea;
  assets: MediaAssetDto[];
}
export interface PhaseGroup {
  phase: MediaPhase;
  areas: AreaGroup[];
}

/** Phase first (before → during → after), then areas in inspection order; empty groups are left out. */
export function groupMedia(assets: MediaAssetDto[]): PhaseGroup[] {
  return MEDIA_PHASES.map((phase) => ({
    phase,
    areas: MEDIA_AREAS.map((area) => ({ area, assets: assets.filter((a) => a.phase === phase && a.area === area) })).filter((g) => g.assets.length),
  })).filter((g) => g.areas.length);
}

/** The order the viewer steps through: the same as the grid shows. */
export const viewerOrder = (groups: PhaseGroup[]): MediaAssetDto[] => groups.flatMap((g) => g.areas.flatMap((a) => a.assets));
