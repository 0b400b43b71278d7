import type { MediaInfo, ReadChunkFunc } from 'mediainfo.js';
import { open } from 'node:fs/promises';

/** What a readable video reports; the duration is null only for a live-recorded WebM (see below). */
export interface VideoInfo {
  durationMs: number | null;
  width: number;
  height: number;
}

/**
 * Duration and frame size of a video (MP4/QuickTime from phones, WebM from the
 * browser's recorder) read by MediaInfoLib compiled to WebAssembly (mediainfo.js).
 * Its .wasm ships inside the npm package and is loaded from node_modules, never
 * fetched. A file without a video track or frame size answers null: a ftyp box
 * followed by noise sniffs as MP4 but is not a video. MP4/QuickTime must also
 * declare a duration (mvhd). A WebM may lack one: the browser's MediaRecorder
 * writes live WebM whose Segment Info has no Duration (optional in the Matroska
 * spec, RFC 9559 §5.1.2.4), and refusing those would refuse the app's own recordings.
 */
export class VideoProbe {
  private instance?: Promise<MediaInfo<'object'>>;
  /** One MediaInfo instance parses one file at a time, so calls queue here. */
  private queue: Promise<unknown> = Promise.resolve();

  probe(path: string): Promise<VideoInfo | null> {
    const run = this.queue.then(() => this.analyze(path));
    this.queue = run.catch(() => undefined);
    return run;
  }

  private async analyze(path: string): Promise<VideoInfo | null> {
    const mediaInfo = await this.load();
    const file = await open(path, 'r');
    try {
      const { size } = await file.stat();
      const read: ReadChunkFunc = async (length, offset) => {
        const chunk = new Uint8Array(Math.max(0, Math.min(length, size - offset)));
        const { bytesRead } = await file.read(chunk, 0, chunk.length, offset);
        return chunk.subarray(0, bytesRead);
      };
      const result = await mediaInfo.analyzeData(size, read);
      return toInfo(result.media?.track ?? []);
    } catch {
      return null;
    } finally {
      await file.close();
    }
  }

  private load(): Promise<MediaInfo<'object'>> {
    const wasm = require.resolve('mediainfo.js/MediaInfoModule.wasm');
    // The module and its wasm load with the first video, not at boot.
    this.instance ??= import('mediainfo.js').then(({ default: mediaInfoFactory }) => mediaInfoFactory({ format: 'object', locateFile: () => wasm }));
    return this.instance;
  }
}

type Track = Record<string, unknown> & { '@type': string };

function toInfo(found: readonly object[]): VideoInfo | null {
  const tracks = found as readonly Track[];
  const general = tracks.find((t) => t['@type'] === 'General');
  const video = tracks.find((t) => t['@type'] === 'Video');
  if (!video) return null;
  const width = positive(video.Width);
  const height = positive(video.Height);
  // Seconds in MediaInfo's object output; the container's duration first, the track's when the container has none.
  const seconds = positive(general?.Duration) ?? positive(video.Duration);
  const liveWebm = general?.Format === 'WebM' || general?.Format === 'Matroska';
  if (width === null || height === null || (seconds === null && !liveWebm)) return null;
  // Phones store portrait clips as landscape frames plus a rotation; report the size as the clip plays.
  const quarterTurn = Math.abs(Number(video.Rotation ?? 0)) % 180 === 90;
  const [w, h] = quarterTurn ? [height, width] : [width, height];
  return { width: Math.round(w), height: Math.round(h), durationMs: seconds === null ? null : Math.round(seconds * 1000) };
}

function positive(value: unknown): number | null {
  const n = typeof value === 'string' ? Number(value) : value;
  return typeof n === 'number' && Number.isFinite(n) && n > 0 ? n : null;
}

export const VIDEO_PROBE = Symbol('VIDEO_PROBE');
