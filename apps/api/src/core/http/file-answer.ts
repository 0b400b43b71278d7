import type { Request, Response } from 'express';
import fresh from 'fresh';
import parseRange from 'range-parser';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream';

/**
 * A file to answer with, described before anything is opened: a 304 or 416
 * never touches storage, and the bytes are opened only for the range sent.
 */
export interface FileToSend {
  /** Total size in bytes. */
  size: number;
  /** A strong validator, quoted (`"<sha256>"`). */
  etag: string;
  contentType: string;
  /** `private, …` for anything behind a session or an owner link. */
  cacheControl: string;
  /** `inline; filename="…"` or `attachment; filename="…"`. */
  disposition?: string;
  /** Single byte ranges are served unless this is false (reports, renders are sent whole). */
  ranges?: boolean;
  headers?: Record<string, string>;
  /** The bytes, whole or an inclusive range: a stream from storage or a buffer already in memory. */
  open: (range?: { start: number; end: number }) => Readable | Buffer | Promise<Readable | Buffer>;
}

/** The status a file request gets (RFC 9110: 200, 206 for one satisfiable range, 304 when fresh, 416 unsatisfiable). */
export type FileStatus = 200 | 206 | 304 | 416;

function chooseRange(req: Request, file: FileToSend): { start: number; end: number } | 'unsatisfiable' | null {
  const header = req.headers.range;
  if (file.ranges === false || !header) return null;
  // If-Range with an old validator: the client's partial copy is stale, so send it all (RFC 9110 §13.1.5).
  const ifRange = req.get('if-range');
  if (ifRange && ifRange.trim() !== file.etag) return null;
  const parsed = parseRange(file.size, header, { combine: true });
  if (parsed === -1) return 'unsatisfiable';
  // Malformed headers, other units and multi-range requests get the whole body (RFC 9110 §14.2 allows it).
  if (parsed === -2 || parsed.type !== 'bytes' || parsed.length !== 1) return null;
  return { start: parsed[0].start, end: parsed[0].end };
}

/**
 * The one way a file goes out: conditional requests (`fresh`), single byte ranges
 * (`range-parser`), and the body through `stream.pipeline`, so a response that is
 * closed, aborted or fails always destroys the read stream and closes its file.
 */
export async function sendFile(req: Request, res: Response, file: FileToSend): Promise<FileStatus> {
  const headers: Record<string, string> = {
    ...file.headers,
    'Content-Type': file.contentType,
    'Cache-Control': file.cacheControl,
    ETag: file.etag,
    ...(file.disposition ? { 'Content-Disposition': file.disposition } : {}),
    ...(file.ranges === false ? {} : { 'Accept-Ranges': 'bytes' }),
  };
  const isRead = req.method === 'GET' || req.method === 'HEAD';
  if (isRead && fresh(req.headers, { etag: file.etag })) return finish(res, 304, headers);
  const range = chooseRange(req, file);
  if (range === 'unsatisfiable') return finish(res, 416, { ...headers, 'Content-Range': `bytes */${file.size}` });
  const status = range ? 206 : 200;
  if (range) headers['Content-Range'] = `bytes ${range.start}-${range.end}/${file.size}`;
  headers['Content-Length'] = String(range ? range.end - range.start + 1 : file.size);
  if (req.method === 'HEAD') return finish(res, status, headers);
  // Opened before the head goes out, so a missing file can still be a clean error answer.
  const body = await file.open(range ?? undefined);
  res.writeHead(status, headers);
  if (Buffer.isBuffer(body)) {
    res.end(body);
    return status;
  }
  // pipeline destroys every stream on error or premature close: no file stays open after the answer.
  pipeline(body, res, () => undefined);
  return status;
}

function finish(res: Response, status: FileStatus, headers: Record<string, string>): FileStatus {
  res.writeHead(status, headers);
  res.end();
  return status;
}
