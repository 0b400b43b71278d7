import type { MediaArea, MediaPhase, MediaSource } from '@benchproof/domain';

/** Tags a shot carries to the server; they can change before, during or after the upload. */
export interface ShotTags {
  phase: MediaPhase;
  area: MediaArea;
  caption: string;
}

export type Transport = 'form' | 'tus';
/** `saving`: being written to the phone's storage (IndexedDB); nothing is sent before it is kept there. */
export type ShotStatus = 'saving' | 'queued' | 'uploading' | 'paused' | 'waiting_retry' | 'done' | 'failed';

export interface QueueItem {
  id: string;
  /** UUID sent with every attempt: the server answers a repeat with the asset it already stored, so a retry never doubles a shot. */
  clientId: string;
  jobId: number;
  file: File;
  transport: Transport;
  source: MediaSource;
  sourceAssetId?: number;
  timecodeMs?: number;
  tags: ShotTags;
  /** Tags the server has (null until stored); a difference means a re-tag is due. */
  savedTags: ShotTags | null;
  status: ShotStatus;
  /** 0..1 of the bytes sent. */
  progress: number;
  /** Failed attempts since the last manual retry. */
  attempts: number;
  retryAt: number | null;
  error: string | null;
  /** The server's error code of the last failure (STORAGE_FULL keeps the shot waiting, never failed). */
  errorCode: string | null;
  assetId: number | null;
  selected: boolean;
}

export type QueueAction =
  | { type: 'add'; items: QueueItem[] }
  | { type: 'saved'; id: string }
  | { type: 'started'; id: string }
  | { type: 'progress'; id: string; progress: number }
  | { type: 'stored'; id: string; assetId: number; tags: ShotTags }
  | { type: 'tagsSaved'; id: string; tags: ShotTags }
  | { type: 'failed'; id: string; message: string; retryable: boolean; now: number; code?: string; offline?: boolean }
  | { type: 'retryDue'; now: number }
  | { type: 'retryNow'; id?: string }
  | { type: 'pause'; id: string }
  | { type: 'resume'; id: string }
  | { type: 'remove'; id: string }
  | { type: 'tag'; ids: string[]; patch: Partial<ShotTags> }
  | { type: 'select'; ids: string[]; selected: boolean };

/** Automatic attempts before a shot waits for a person to press retry. */
export const MAX_AUTO_ATTEMPTS = 6;
/** Files above this size (and every video) go through the resumable protocol. */
export const TUS_THRESHOLD_BYTES = 16 * 1024 * 1024;

/** A full server disk is not this shot's fault: it stays queued and is offered again every minute until space is freed. */
export const STORAGE_FULL_RETRY_MS = 60_000;

/** The error code a shot carries while the phone could not reach the server at all. */
export const OFFLINE_CODE = 'OFFLINE';

/** Turned away only because nobody was signed in: not the shot's fault, so it goes again after the next sign-in. */
const SIGNED_OUT_CODES: ReadonlySet<string> = new Set(['UNAUTHENTICATED', 'SESSION_EXPIRED']);

/**
 * Refused: the server (or six failed attempts) said no for this shot, so it waits for a person to retry or delete
 * it; nothing sends it again by itself, not the `online` event, not the next sign-in, not a reload.
 */
export const isRefused = (i: QueueItem): boolean => i.status === 'failed' && !SIGNED_OUT_CODES.has(i.errorCode ?? '');

/** Exponential backoff: 1 s, 2 s, 4 s … capped at 30 s. */
export function backoffMs(attempts: number): number {
  return Math.min(30_000, 1000 * 2 ** Math.max(0, attempts - 1));
}

export function transportFor(file: File): Transport {
  return file.type.startsWith('video/') || file.size > TUS_THRESHOLD_BYTES ? 'tus' : 'form';
}

/**
 * A random (version 4) UUID, RFC 9562 §5.4. `crypto.randomUUID` exists only in secure contexts, and the
 * workshop server may be opened over plain http on the shop's network; `getRandomValues` works in both.
 */
export function newClientId(): string {
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** The state of a shot nothing has been sent of yet, as far as this page knows. */
export const NOT_SENT = {
  savedTags: null,
  status: 'queued',
  progress: 0,
  attempts: 0,
  retryAt: null,
  error: null,
  errorCode: null,
  assetId: null,
  selected: false,
} as const satisfies Partial<QueueItem>;

let seq = 0;
export function newItem(jobId: number, file: File, tags: ShotTags, extra: Partial<Pick<QueueItem, 'source' | 'sourceAssetId' | 'timecodeMs'>> = {}): QueueItem {
  seq += 1;
  return {
    id: `shot-${Date.now().toString(36)}-${seq}`,
    clientId: newClientId(),
    jobId,
    file,
    transport: transportFor(file),
    source: extra.source ?? 'camera',
    sourceAssetId: extra.sourceAssetId,
    timecodeMs: extra.timecodeMs,
    tags,
    ...NOT_SENT,
  };
}

const sameTags = (a: ShotTags, b: ShotTags) => a.phase === b.phase && a.area === b.area && a.caption === b.caption;

/** True when a stored shot's tags were changed after it was sent. */
export const needsRetag = (i: QueueItem): boolean => i.status === 'done' && i.savedTags !== null && !sameTags(i.tags, i.savedTags);

function onFailed(item: QueueItem, a: Extract<QueueAction, { type: 'failed' }>): QueueItem {
  if (item.status === 'paused') return item;
  // No answer at all (Wi-Fi gone): never the shot's fault, so it waits however long the outage lasts.
  if (a.offline)
    return {
      ...item,
      error: a.message,
      errorCode: OFFLINE_CODE,
      status: 'waiting_retry',
      retryAt: a.now + backoffMs(Math.min(item.attempts + 1, MAX_AUTO_ATTEMPTS)),
      attempts: item.attempts + 1,
    };
  if (a.code === 'STORAGE_FULL') return { ...item, error: a.message, errorCode: a.code, status: 'waiting_retry', retryAt: a.now + STORAGE_FULL_RETRY_MS };
  const attempts = item.attempts + 1;
  const auto = a.retryable && attempts < MAX_AUTO_ATTEMPTS;
  return {
    ...item,
    attempts,
    error: a.message,
    errorCode: a.code ?? null,
    status: auto ? 'waiting_retry' : 'failed',
    retryAt: auto ? a.now + backoffMs(attempts) : null,
  };
}

function update(item: QueueItem, a: QueueAction): QueueItem {
  switch (a.type) {
    case 'saved':
      return item.status === 'saving' ? { ...item, status: 'queued' } : item;
    case 'started':
      return { ...item, status: 'uploading', retryAt: null };
    case 'progress':
      return item.status === 'uploading' ? { ...item, progress: Math.max(item.progress, a.progress) } : item;
    case 'stored':
      return { ...item, status: 'done', progress: 1, assetId: a.assetId, savedTags: a.tags, error: null, errorCode: null, retryAt: null };
    case 'tagsSaved':
      return { ...item, savedTags: a.tags };
    case 'failed':
      return onFailed(item, a);
    case 'retryDue':
      return item.status === 'waiting_retry' && item.retryAt !== null && item.retryAt <= a.now ? { ...item, status: 'queued', retryAt: null } : item;
    case 'retryNow':
      // Everything waiting goes again; a refused shot only on its own Retry button.
      return item.status === 'waiting_retry' || (item.status === 'failed' && (a.id !== undefined || !isRefused(item)))
        ? { ...item, status: 'queued', attempts: 0, retryAt: null }
        : item;
    case 'pause':
      return item.status === 'done' || item.status === 'failed' ? item : { ...item, status: 'paused', retryAt: null };
    case 'resume':
      return item.status === 'paused' ? { ...item, status: 'queued' } : item;
    case 'tag':
      return { ...item, tags: { ...item.tags, ...a.patch } };
    case 'select':
      return { ...item, selected: a.selected };
    case 'add':
    case 'remove':
      return item;
  }
}

const targets = (a: QueueAction, item: QueueItem): boolean => {
  if (a.type === 'retryDue' || (a.type === 'retryNow' && a.id === undefined)) return true;
  if (a.type === 'tag' || a.type === 'select') return a.ids.includes(item.id);
  return 'id' in a && a.id === item.id;
};

/** The upload queue as a pure state machine; the runner performs the side effects it implies. */
export function queueReducer(items: QueueItem[], a: QueueAction): QueueItem[] {
  if (a.type === 'add') return [...items, ...a.items];
  if (a.type === 'remove') return items.filter((i) => i.id !== a.id || i.status === 'uploading');
  return items.map((i) => (targets(a, i) ? update(i, a) : i));
}

/** States of an earlier shot of the same job that hold a later one back, so a job's shots are stored in the order taken. */
const HOLDS_LATER: ReadonlySet<ShotStatus> = new Set(['saving', 'uploading', 'waiting_retry']);

/**
 * Shots to start now, at most `limit` transfers at a time. Within one job they go one after another in the
 * order taken (a paused or refused shot does not hold the rest); different jobs may go side by side.
 */
export function nextToStart(items: QueueItem[], limit: number): QueueItem[] {
  const running = items.filter((i) => i.status === 'uploading').length;
  const held = new Set<number>();
  const ready: QueueItem[] = [];
  for (const i of items) {
    if (i.status === 'queued' && !held.has(i.jobId)) ready.push(i);
    if (i.status === 'queued' || HOLDS_LATER.has(i.status)) held.add(i.jobId);
  }
  return ready.slice(0, Math.max(0, limit - running));
}

/** The earliest pending automatic retry, for the runner's timer. */
export function nextRetryAt(items: QueueItem[]): number | null {
  const times = items.flatMap((i) => (i.status === 'waiting_retry' && i.retryAt !== null ? [i.retryAt] : []));
  return times.length ? Math.min(...times) : null;
}

/** HTTP statuses worth another try: no answer, timeouts, throttling and server trouble. */
export const isRetryableStatus = (status: number): boolean => status === 0 || status === 408 || status === 429 || status >= 500;
