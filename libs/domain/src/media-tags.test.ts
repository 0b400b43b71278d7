import { INSPECTION_AREAS } from './inspection-areas';
import { MEDIA_AREAS, MEDIA_AREA_LABELS, MEDIA_KINDS, MEDIA_KIND_LABELS, MEDIA_PHASES, MEDIA_SOURCES, isVideoKind, mediaKindFor } from './media-tags';

describe('media tags (DESIGN.md: Media asset)', () => {
  it('phases, sources, kinds', () => {
    expect(MEDIA_PHASES).toEqual(['before', 'during', 'after']);
    expect(MEDIA_SOURCES).toEqual(['camera', 'scope', 'upload']);
    expect(MEDIA_KINDS.map((k) => MEDIA_KIND_LABELS[k])).toEqual(['Photo', 'Video', 'Scope still', 'Scope video']);
  });

  it('areas are the inspection areas plus the whole bike', () => {
    expect(MEDIA_AREAS).toEqual([...INSPECTION_AREAS, 'whole_bike']);
    expect(MEDIA_AREA_LABELS.whole_bike).toBe('Whole bike');
    expect(MEDIA_AREA_LABELS.frame_interior).toBe('Frame interior (scope)');
  });

  it.each([
    { source: 'scope', video: false, kind: 'scope_still' },
    { source: 'scope', video: true, kind: 'scope_video' },
    { source: 'camera', video: false, kind: 'photo' },
    { source: 'upload', video: true, kind: 'video' },
  ] as const)('$source, video $video → $kind', ({ source, video, kind }) => {
    expect(mediaKindFor(source, video)).toBe(kind);
    expect(isVideoKind(kind)).toBe(video);
  });
});
