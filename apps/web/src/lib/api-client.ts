import type { ErrorBody, ErrorCode } from '@benchproof/contracts';

/** An API failure with the server's error code; screens switch on `code`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | 'NETWORK',
    message: string,
    readonly details: unknown = null,
  ) {
    super(message);
  }

  /**
   * Field messages from a VALIDATION_FAILED body, keyed by field path, for Mantine forms.
   * `toField` renames request paths to the form's boxes where the two differ (e.g. taxRateBp → taxRatePct).
   */
  fieldErrors(toField: (path: string) => string = (p) => p): Record<string, string> {
    const issues = (this.details as { issues?: { path: string; message: string }[] } | null)?.issues ?? [];
    return Object.fromEntries(issues.map((i) => [toField(i.path), i.message]));
  }
}

let csrfToken: string | null = null;
let onSessionLost: (code: ErrorCode) => void = () => undefined;

export const setCsrfToken = (token: string | null): void => {
  csrfToken = token;
};

/** The CSRF header for requests made outside api() (XHR and resumable uploads). */
export const csrfHeader = (): Record<string, string> => (csrfToken ? { 'x-csrf-token': csrfToken } : {});

/** Called when a signed-in call comes back 401; the app sends the user to sign-in. */
export const handleSessionLost = (fn: (code: ErrorCode) => void): void => {
  onSessionLost = fn;
};

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  query?: Record<string, string | number | boolean | undefined | null | (string | number)[]>;
  /** Sign-in and session probes handle 401 themselves. */
  quietAuth?: boolean;
  signal?: AbortSignal;
}

export function withQuery(path: string, query?: RequestOptions['query']): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) {
    if (v === undefined || v === null || v === '') continue;
    for (const item of Array.isArray(v) ? v : [v]) params.append(k, String(item));
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

/** JSON over fetch with the session cookie and the CSRF header; every failure becomes an ApiError. */
export async function api<T>(path: string, opts: RequestOptions = {}): Promise<T> {
  const method = opts.method ?? 'GET';
  const headers: Record<string, string> = { accept: 'application/json' };
  const isForm = opts.body instanceof FormData;
  if (opts.body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['x-csrf-token'] = csrfToken;
  let res: Response;
  try {
    res = await fetch(withQuery(`/api${path}`, opts.query), {
      method,
      headers,
      credentials: 'same-origin',
      signal: opts.signal,
      body: opts.body === undefined ? undefined : isForm ? (opts.body as FormData) : JSON.stringify(opts.body),
    });
  } catch {
    throw new ApiError(0, 'NETWORK', 'No connection to the workshop server. Your input is kept; try again.');
  }
  if (res.status === 204) return undefined as T;
  const body: unknown = await res.json().catch(() => null);
  if (res.ok) return body as T;
  const err = (body ?? {}) as Partial<ErrorBody>;
  const apiError = new ApiError(res.status, err.code ?? 'INTERNAL', err.message ?? `Request failed (${res.status})`, err.details ?? null);
  if (res.status === 401 && !opts.quietAuth) onSessionLost(apiError.code as ErrorCode);
  throw apiError;
}
