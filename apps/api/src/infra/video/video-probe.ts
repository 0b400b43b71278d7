import { open, type FileHandle } from 'node:fs/promises';

export interface VideoInfo {
  durationMs: number | null;
  width: number | null;
  height: number | null;
}

const NONE: VideoInfo = { durationMs: null, width: null, height: null };
const MAX_MOOV_BYTES = 32 * 1024 * 1024;

/**
 * Duration and frame size of an MP4/MOV from its `moov` box (ISO/IEC 14496-12:
 * mvhd timescale + duration, tkhd width/height as 16.16 fixed point), without
 * decoding anything. Other containers (WebM) report nulls.
 */
export class VideoProbe {
  async probe(path: string): Promise<VideoInfo> {
    const file = await open(path, 'r');
    try {
      const moov = await findTopLevelBox(file, 'moov');
      return moov ? parseMoov(moov) : NONE;
    } catch {
      return NONE;
    } finally {
      await file.close();
    }
  }
}

async function findTopLevelBox(file: FileHandle, type: string): Promise<Buffer | null> {
  const { size } = await file.stat();
  const head = Buffer.alloc(16);
  let pos = 0;
  while (pos + 8 <= size) {
    await file.read(head, 0, 16, pos);
    let boxSize = head.readUInt32BE(0);
    let headerLen = 8;
    if (boxSize === 1) {
      boxSize = Number(head.readBigUInt64BE(8));
      headerLen = 16;
    } else if (boxSize === 0) boxSize = size - pos;
    if (boxSize < headerLen) return null;
    if (head.toString('latin1', 4, 8) === type) {
      const len = boxSize - headerLen;
      if (len > MAX_MOOV_BYTES) return null;
      const body = Buffer.alloc(len);
      await file.read(body, 0, len, pos + headerLen);
      return body;
    }
    pos += boxSize;
  }
  return null;
}

function* children(buf: Buffer): Generator<{ type: string; body: Buffer }> {
  let pos = 0;
  while (pos + 8 <= buf.length) {
    const size = buf.readUInt32BE(pos);
    if (size < 8 || pos + size > buf.length) return;
    yield { type: buf.toString('latin1', pos + 4, pos + 8), body: buf.subarray(pos + 8, pos + size) };
    pos += size;
  }
}

function parseMoov(moov: Buffer): VideoInfo {
  const info: VideoInfo = { ...NONE };
  for (const box of children(moov)) {
    if (box.type === 'mvhd') info.durationMs = mvhdDurationMs(box.body);
    if (box.type === 'trak' && info.width === null) {
      const tkhd = [...children(box.body)].find((c) => c.type === 'tkhd');
      const size = tkhd ? tkhdSize(tkhd.body) : null;
      if (size && size.width > 0) Object.assign(info, size);
    }
  }
  return info;
}

function mvhdDurationMs(b: Buffer): number | null {
  const v1 = b[0] === 1;
  const timescale = v1 ? b.readUInt32BE(20) : b.readUInt32BE(12);
  const duration = v1 ? Number(b.readBigUInt64BE(24)) : b.readUInt32BE(16);
  return timescale > 0 ? Math.round((duration * 1000) / timescale) : null;
}

function tkhdSize(b: Buffer): { width: number; height: number } | null {
  const at = b.length - 8;
  if (at < 0) return null;
  return { width: Math.round(b.readUInt32BE(at) / 65536), height: Math.round(b.readUInt32BE(at + 4) / 65536) };
}

export const VIDEO_PROBE = Symbol('VIDEO_PROBE');
