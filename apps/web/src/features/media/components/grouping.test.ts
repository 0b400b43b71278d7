import type { MediaAssetDto } from '@benchproof/contracts';
import { groupMedia, viewerOrder } from './grouping';

const asset = (id: number, phase: MediaAssetDto['phase'], area: MediaAssetDto['area']) => ({ id, phase, area }) as MediaAssetDto;

describe('groupMedia', () => {
  it('groups by phase in workshop order, then by area in inspection order, leaving out empty groups', () => {
    const groups = groupMedia([
      asset(1, 'after', 'brakes'),
      asset(2, 'before', 'frame_interior'),
      asset(3, 'before', 'frame_fork'),
      asset(4, 'before', 'frame_fork'),
    ]);
    expect(groups.map((g) => [g.phase, g.areas.map((a) => a.area)])).toEqual([
      ['before', ['frame_fork', 'frame_interior']],
      ['after', ['brakes']],
    ]);
    expect(viewerOrder(groups).map((a) => a.id)).toEqual([3, 4, 2, 1]);
  });
});
