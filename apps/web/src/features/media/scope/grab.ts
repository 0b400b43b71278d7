/** JPEG quality for grabbed stills: sharp enough to read a crack, small enough for a phone uplink. */
const QUALITY = 0.92;

/** Draws the video's current frame at its native size and encodes it as a JPEG file. */
export function grabFrame(video: HTMLVideoElement, name: string): Promise<File> {
  const canvas = document.createElement('canvas');
  canvas.width = video.videoWidth;
  canvas.height = video.videoHeight;
  const ctx = canvas.getContext('2d');
  if (!ctx || !canvas.width) return Promise.reject(new Error('The picture is not ready yet.'));
  ctx.drawImage(video, 0, 0, canvas.width, canvas.height);
  return new Promise((resolve, reject) =>
    canvas.toBlob(
      (blob) =>
        blob ? resolve(new File([blob], name, { type: 'image/jpeg', lastModified: Date.now() })) : reject(new Error('The frame could not be encoded.')),
      'image/jpeg',
      QUALITY,
    ),
  );
}

/** A file name that sorts by time: scope-20260314-101502-123.jpg */
export function stillName(prefix: string, at = new Date()): string {
  const p = (n: number, w = 2) => String(n).padStart(w, '0');
  return `${prefix}-${at.getFullYear()}${p(at.getMonth() + 1)}${p(at.getDate())}-${p(at.getHours())}${p(at.getMinutes())}${p(at.getSeconds())}-${p(at.getMilliseconds(), 3)}.jpg`;
}

/** One frame at the usual 30 fps of phone and scope video; browsers do not expose the real rate. */
export const FRAME_S = 1 / 30;

/** The time a step lands on, kept inside the video. */
export const stepTime = (current: number, delta: number, duration: number): number =>
  Math.min(Math.max(0, current + delta), Number.isFinite(duration) ? duration : current + delta);

/** Pauses and moves the video by `delta` seconds (a frame or a second). */
export function stepVideo(video: HTMLVideoElement, delta: number): void {
  video.pause();
  video.currentTime = stepTime(video.currentTime, delta, video.duration);
}

/** Play when paused, pause when playing. */
export function togglePlay(video: HTMLVideoElement): void {
  if (video.paused) void video.play();
  else video.pause();
}
