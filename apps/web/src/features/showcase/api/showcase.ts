import type {
  CaptionDraftDto,
  ShowcaseExportQuery,
  ShowcaseExportTaskDto,
  ShowcaseItemDto,
  ShowcaseQuery,
  ShowcaseZipRequest,
  UpdateShowcaseItemRequest,
  ErrorBody,
} from '@benchproof/contracts';
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, ApiError, csrfHeader, withQuery } from '../../../lib/api-client';

export const showcaseKeys = {
  all: ['showcase'] as const,
  items: (q: ShowcaseQuery) => ['showcase', 'items', q] as const,
  export: (key: string) => ['showcase', 'export', key] as const,
};

/** Consent can be withdrawn at any moment on the owner page: look again often. */
export const useShowcaseItems = (q: ShowcaseQuery) =>
  useQuery({
    queryKey: showcaseKeys.items(q),
    queryFn: () => api<ShowcaseItemDto[]>('/showcase/items', { query: q }),
    placeholderData: keepPreviousData,
    refetchInterval: 15_000,
  });

export function useUpdateShowcaseItem(pairId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateShowcaseItemRequest) => api<ShowcaseItemDto>(`/showcase/items/${pairId}`, { method: 'PATCH', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: showcaseKeys.all }),
  });
}

export const fetchCaptionDraft = (pairId: number) => api<CaptionDraftDto>(`/showcase/items/${pairId}/caption-draft`);

/** Fetches a file and hands it to the browser as a download; refusals become ApiErrors (e.g. CONSENT_REVOKED). */
async function download(url: string, init: RequestInit, fallbackName: string): Promise<void> {
  let res: Response;
  try {
    res = await fetch(url, { credentials: 'same-origin', ...init });
  } catch {
    throw new ApiError(0, 'NETWORK', 'No connection to the workshop server. Try again.');
  }
  if (!res.ok) {
    const err = ((await res.json().catch(() => null)) ?? {}) as Partial<ErrorBody>;
    throw new ApiError(res.status, err.code ?? 'INTERNAL', err.message ?? `Export failed (${res.status})`, err.details ?? null);
  }
  const name = /filename="([^"]+)"/.exec(res.headers.get('content-disposition') ?? '')?.[1] ?? fallbackName;
  const href = URL.createObjectURL(await res.blob());
  const a = Object.assign(document.createElement('a'), { href, download: name });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(href), 10_000);
}

export const downloadExport = (pairId: number, q: ShowcaseExportQuery) =>
  download(withQuery(`/api/showcase/items/${pairId}/export`, { variant: q.variant, size: q.size, layout: q.layout }), {}, `pair-${pairId}.jpg`);

export const downloadZip = (req: ShowcaseZipRequest) =>
  download(
    '/api/showcase/zip',
    { method: 'POST', headers: { 'content-type': 'application/json', ...csrfHeader() }, body: JSON.stringify(req) },
    'showcase.zip',
  );

/** A large selection: queued on the server as a background export (consent is checked before it is accepted). */
export const startExport = (req: ShowcaseZipRequest) => api<ShowcaseExportTaskDto>('/showcase/exports', { method: 'POST', body: req });

const finished = (t: ShowcaseExportTaskDto | undefined) => t?.state === 'done' || t?.state === 'failed';

/** A background export's state and progress, asked for every second until it is done, failed or refused. */
export const useExportTask = (start: ShowcaseExportTaskDto) =>
  useQuery({
    queryKey: showcaseKeys.export(start.key),
    queryFn: () => api<ShowcaseExportTaskDto>(`/showcase/exports/${encodeURIComponent(start.key)}`),
    initialData: start,
    initialDataUpdatedAt: 0,
    // A refusal (e.g. SHOWCASE_DESK_OFF) ends the polling; a dropped connection does not.
    refetchInterval: (q) => (finished(q.state.data) || (q.state.error instanceof ApiError && q.state.error.code !== 'NETWORK') ? false : 1000),
  });

/** The finished zip; the server checks every item's consent again before sending it. */
export const downloadFinishedExport = (key: string) => download(`/api/showcase/exports/${encodeURIComponent(key)}/download`, {}, 'showcase.zip');
