import { ERROR_CODES, ErrorBodySchema, type ErrorBody, type ErrorCode } from '@benchproof/contracts';

/**
 * @tus/server answers protocol errors as plain text ("Upload-Offset conflict\n").
 * The web and scripts switch on `code`, so every tus error leaves as the one
 * `{code, message, details}` body; the tus text stays in details for debugging.
 * Matched on the library's own texts (@tus/utils ERRORS); anything unknown falls
 * back on its status.
 */
const BY_TEXT: readonly [RegExp, ErrorCode][] = [
  [/^Tus-Resumable Required/i, 'TUS_VERSION_REQUIRED'],
  [/Upload-Offset conflict/i, 'UPLOAD_OFFSET_CONFLICT'],
  [/no longer exists/i, 'UPLOAD_GONE'],
  [/size exceeded|Maximum size exceeded/i, 'FILE_TOO_LARGE'],
  [/already completed upload/i, 'CONFLICT'],
  [/lock/i, 'UPLOAD_BUSY'],
  [/not found/i, 'NOT_FOUND'],
  [/header required|^Invalid |Upload-Metadata is invalid|Upload-Length or Upload-Defer-Length/i, 'TUS_HEADER_INVALID'],
];

const BY_STATUS: Record<number, ErrorCode> = {
  400: 'TUS_HEADER_INVALID',
  403: 'TUS_HEADER_INVALID',
  404: 'NOT_FOUND',
  409: 'UPLOAD_OFFSET_CONFLICT',
  410: 'UPLOAD_GONE',
  412: 'TUS_VERSION_REQUIRED',
  413: 'FILE_TOO_LARGE',
};

export function tusErrorBody(status: number, text: string): { status: number; body: ErrorBody } {
  const ours = parseOurs(text);
  if (ours) return { status, body: ours };
  const tusText = text.trim();
  const code = BY_TEXT.find(([pattern]) => pattern.test(tusText))?.[1] ?? BY_STATUS[status] ?? (status >= 500 ? 'INTERNAL' : 'TUS_HEADER_INVALID');
  return { status: ERROR_CODES[code].status, body: { code, message: ERROR_CODES[code].message, details: tusText ? { tus: tusText } : null } };
}

/** Hook failures (our own DomainErrors) already carry the JSON body. */
function parseOurs(text: string): ErrorBody | null {
  try {
    const parsed = ErrorBodySchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** Rewrites an error Response from tus into the JSON error shape; other responses pass through. */
export async function withJsonError(res: Response, method: string): Promise<Response> {
  if (res.status < 400) return res;
  const { status, body } = tusErrorBody(res.status, await res.text());
  const headers = new Headers(res.headers);
  const json = JSON.stringify(body);
  headers.set('Content-Type', 'application/json; charset=utf-8');
  headers.set('Content-Length', String(Buffer.byteLength(json)));
  return new Response(method === 'HEAD' ? null : json, { status, headers });
}
