import { INSPECTION_AREAS, INSPECTION_AREA_LABELS, type InspectionArea } from './inspection-areas';

export const MEDIA_PHASES = ['before', 'during', 'after'] as const;
export type MediaPhase = (typeof MEDIA_PHASES)[number];
export const MEDIA_PHASE_LABELS: Readonly<Record<MediaPhase, string>> = {
  before: 'Before',
  during: 'During',
  after: 'After',
};

export const MEDIA_SOURCES = ['camera', 'scope', 'upload'] as const;
export type MediaSource = (typeof MEDIA_SOURCES)[number];
export const MEDIA_SOURCE_LABELS: Readonly<Record<MediaSource, string>> = {
  camera: 'Camera',
  scope: 'Scope',
  upload: 'Upload',
};

export const MEDIA_KINDS = ['photo', 'video', 'scope_still', 'scope_video'] as const;
export type MediaKind = (typeof MEDIA_KINDS)[number];
export const MEDIA_KIND_LABELS: Readonly<Record<MediaKind, string>> = {
  photo: 'Photo',
  video: 'Video',
  scope_still: 'Scope still',
  scope_video: 'Scope video',
};

/** Media can show one inspection area or the whole bike. */
export const MEDIA_AREAS = [...INSPECTION_AREAS, 'whole_bike'] as const;
export type MediaArea = InspectionArea | 'whole_bike';
export const MEDIA_AREA_LABELS: Readonly<Record<MediaArea, string>> = {
  ...INSPECTION_AREA_LABELS,
  whole_bike: 'Whole bike',
};

/** True for video kinds (stills can be grabbed from them). */
export function isVideoKind(kind: MediaKind): boolean {
  return kind === 'video' || kind === 'scope_video';
}

/**
 * The kind an incoming file gets from where it came from and whether it is a
 * video: anything from the scope is a scope kind, everything else a photo or
 * video.
 */
export function mediaKindFor(source: MediaSource, isVideo: boolean): MediaKind {
  if (source === 'scope') return isVideo ? 'scope_video' : 'scope_still';
  return isVideo ? 'video' : 'photo';
}
