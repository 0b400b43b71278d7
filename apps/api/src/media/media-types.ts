import type { SniffedType } from '../infra/sniff';

export type AcceptedType = { family: 'image' | 'video'; mime: string; ext: string };

const IMAGES = new Set(['jpg', 'png', 'webp']);
const HEIF = new Set(['heic', 'heif']);
const VIDEOS = new Set(['mp4', 'mov', 'webm']);

/**
 * The formats BenchProof keeps, decided from the sniffed bytes only: JPEG, PNG, WebP,
 * HEIC/HEIF where this sharp build decodes it, and MP4/MOV/WebM video. Anything else
 * (including SVG and HTML, which file-type does not report) is refused.
 */
export function acceptedType(sniffed: SniffedType | undefined, heicReadable: boolean): AcceptedType | null {
  if (!sniffed) return null;
  if (IMAGES.has(sniffed.ext) || (heicReadable && HEIF.has(sniffed.ext))) return { family: 'image', ...sniffed };
  if (VIDEOS.has(sniffed.ext)) return { family: 'video', ...sniffed };
  return null;
}
