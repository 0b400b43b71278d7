export { mediaKeys } from './api/media-keys';
export { findingMediaQuery, useFindingMedia, useLinkFindingMedia, useMedia } from './api/media';
export { CapturePanel } from './components/capture-panel';
export { JobMediaSection } from './components/job-media-section';
export { FindingMediaPicker } from './components/finding-media-picker';
export { ScopePanel } from './scope/scope-panel';
export { UploadBadge } from './components/upload-badge';
export { attachShots, detachShots, useWaitingCount } from './upload/frame-shots';
