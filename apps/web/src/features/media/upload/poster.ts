import { csrfHeader } from '../../../lib/api-client';
import { grabFrame } from '../scope/grab';

/** Where the poster frame is taken: one second in, or the middle of a shorter clip. */
const posterTime = (duration: number): number => (Number.isFinite(duration) && duration > 0 ? Math.min(1, duration / 2) : 0);

function seekLocalVideo(file: File): Promise<{ video: HTMLVideoElement; release: () => void }> {
  const url = URL.createObjectURL(file);
  const video = document.createElement('video');
  video.muted = true;
  video.preload = 'auto';
  video.src = url;
  const release = () => URL.revokeObjectURL(url);
  return new Promise((resolve, reject) => {
    video.onloadedmetadata = () => {
      video.currentTime = posterTime(video.duration);
    };
    video.onseeked = () => resolve({ video, release });
    video.onerror = () => {
      release();
      reject(new Error('This browser cannot decode the video for a poster frame.'));
    };
  });
}

/**
 * The server has no video decoder, so the browser that recorded or chose the video
 * sends its poster frame: drawn from the local file, checked and stripped server-side
 * like any photo. Best effort: without it the grid shows the "no poster yet" tile.
 */
export async function sendPoster(jobId: number, assetId: number, file: File): Promise<boolean> {
  const { video, release } = await seekLocalVideo(file);
  try {
    const frame = await grabFrame(video, `poster-${assetId}.jpg`);
    const form = new FormData();
    form.append('file', frame, frame.name);
    const res = await fetch(`/api/jobs/${jobId}/media/${assetId}/poster`, {
      method: 'PUT',
      body: form,
      credentials: 'same-origin',
      headers: { accept: 'application/json', ...csrfHeader() },
    });
    return res.ok;
  } finally {
    release();
  }
}
