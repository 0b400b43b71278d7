import type { TusUploadStatus, UploadBatchResult } from '@benchproof/contracts';
import * as tus from 'tus-js-client';
import { csrfHeader } from '../../../lib/api-client';
import { isRetryableStatus, type QueueItem } from './queue';

/** What a finished or failed transfer tells the queue. */
export type TransferOutcome = { ok: true; assetId: number } | { ok: false; message: string; retryable: boolean; code?: string; offline?: boolean };

export interface Transfer {
  done: Promise<TransferOutcome>;
  abort: () => void;
}

const OFFLINE = 'No connection to the workshop server. The shot is kept and will be sent again.';

/** Form fields (multipart) and Upload-Metadata (tus) of one shot: its tags and its client id. */
export function tagFields(item: QueueItem): Record<string, string> {
  const fields: Record<string, string> = {
    phase: item.tags.phase,
    area: item.tags.area,
    source: item.source,
    caption: item.tags.caption,
    clientId: item.clientId,
  };
  if (item.sourceAssetId !== undefined) fields.sourceAssetId = String(item.sourceAssetId);
  if (item.timecodeMs !== undefined) fields.timecodeMs = String(item.timecodeMs);
  return fields;
}

/** The server's own words for a failure: the per-file result when there is one, else the error body. */
export function messageFromBody(status: number, text: string): string {
  try {
    const body = JSON.parse(text) as { message?: string; details?: { results?: UploadBatchResult['results'] } };
    const failed = body.details?.results?.find((r) => !r.ok);
    if (failed && !failed.ok) return failed.error.message;
    if (body.message) return body.message;
  } catch {
    /* not JSON: fall through */
  }
  return status === 0 ? OFFLINE : `Upload failed (${status}).`;
}

/** The error code of a failed answer, when its body is the API's `{code, message, details}`. */
export function codeFromBody(text: string): string | undefined {
  try {
    const code = (JSON.parse(text) as { code?: unknown }).code;
    return typeof code === 'string' ? code : undefined;
  } catch {
    return undefined;
  }
}

function outcomeOfForm(xhr: XMLHttpRequest): TransferOutcome {
  if (xhr.status === 201 || xhr.status === 207) {
    const body = JSON.parse(xhr.responseText) as UploadBatchResult;
    const result = body.results[0];
    if (result?.ok) return { ok: true, assetId: result.asset.id };
    return { ok: false, message: result?.error.message ?? 'The server did not store the file.', retryable: false };
  }
  return { ok: false, message: messageFromBody(xhr.status, xhr.responseText), retryable: isRetryableStatus(xhr.status), code: codeFromBody(xhr.responseText) };
}

/** One photo in one multipart request, so each shot has its own progress and its own retries. */
export function sendForm(item: QueueItem, onProgress: (p: number) => void): Transfer {
  const xhr = new XMLHttpRequest();
  const done = new Promise<TransferOutcome>((resolve) => {
    const form = new FormData();
    for (const [k, v] of Object.entries(tagFields(item))) form.append(k, v);
    form.append('files', item.file, item.file.name);
    xhr.open('POST', `/api/jobs/${item.jobId}/media`);
    for (const [k, v] of Object.entries({ accept: 'application/json', ...csrfHeader() })) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => resolve(outcomeOfForm(xhr));
    xhr.onerror = () => resolve({ ok: false, message: OFFLINE, retryable: true, offline: true });
    xhr.ontimeout = xhr.onerror;
    xhr.onabort = () => resolve({ ok: false, message: 'Paused.', retryable: false });
    xhr.send(form);
  });
  return { done, abort: () => xhr.abort() };
}

async function assetIdFromStatus(uploadUrl: string | null): Promise<number | null> {
  if (!uploadUrl) return null;
  const res = await fetch(uploadUrl, { headers: { accept: 'application/json' }, credentials: 'same-origin' }).catch(() => null);
  if (!res?.ok) return null;
  return ((await res.json()) as TusUploadStatus).assetId;
}

/**
 * tus-js-client has already retried (retryDelays) when onError fires, so the upload queue must
 * not retry it a second time: the shot waits for a person's retry, which resumes at the server's offset.
 */
export function tusFailure(err: Error): TransferOutcome {
  const res = (err as tus.DetailedError).originalResponse ?? null;
  if (!res) return { ok: false, message: OFFLINE, retryable: false, offline: true };
  const status = res.getStatus();
  return { ok: false, message: messageFromBody(status, res.getBody()), retryable: false, code: codeFromBody(res.getBody()) };
}

/**
 * A large file or video over tus: tus-js-client retries dropped chunks itself and, by
 * the file's fingerprint in localStorage, a later attempt resumes at the server's offset.
 */
export function sendTus(item: QueueItem, onProgress: (p: number) => void): Transfer {
  let upload: tus.Upload | null = null;
  const done = new Promise<TransferOutcome>((resolve) => {
    upload = new tus.Upload(item.file, {
      endpoint: `${window.location.origin}/api/media/tus`,
      chunkSize: 4 * 1024 * 1024,
      retryDelays: [0, 1000, 3000, 5000, 10000, 20000],
      removeFingerprintOnSuccess: true,
      // The shot's own id, not the file's name, size and date: a file rebuilt from IndexedDB after a reload has a new
      // date, and must still find its earlier upload and resume at the server's offset.
      fingerprint: () => Promise.resolve(`benchproof-shot-${item.clientId}`),
      headers: csrfHeader(),
      metadata: { ...tagFields(item), jobId: String(item.jobId), filename: item.file.name },
      onProgress: (sent, total) => onProgress(total ? sent / total : 0),
      onError: (err) => resolve(tusFailure(err)),
      onSuccess: ({ lastResponse }) => {
        const header = lastResponse.getHeader('BenchProof-Media-Id');
        const url = upload?.url ?? null;
        void (header ? Promise.resolve(Number(header)) : assetIdFromStatus(url)).then((id) =>
          resolve(id ? { ok: true, assetId: id } : { ok: false, message: 'The server did not confirm the upload.', retryable: false }),
        );
      },
    });
    const current = upload;
    void current.findPreviousUploads().then((previous) => {
      if (previous[0]) current.resumeFromPreviousUpload(previous[0]);
      current.start();
    });
  });
  return { done, abort: () => void upload?.abort() };
}

export const startTransfer = (item: QueueItem, onProgress: (p: number) => void): Transfer =>
  item.transport === 'tus' ? sendTus(item, onProgress) : sendForm(item, onProgress);
