export { VideoProbe, VIDEO_PROBE, type VideoInfo } from './video-probe';
