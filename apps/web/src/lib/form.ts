import { schemaResolver, type UseFormReturnType } from '@mantine/form';
import { z } from 'zod';
import { ApiError } from './api-client';

/** Renames a request path to the form box that holds it; unknown paths stay as they are. */
export type PathMap = (path: string) => string;
const samePath: PathMap = (p) => p;

/** A PathMap from a table of request path → form path (exact matches only). */
export const pathTable =
  (table: Readonly<Record<string, string>>): PathMap =>
  (p) =>
    table[p] ?? p;

/**
 * The web's one validation pattern: the contract's zod schema through Mantine's
 * schemaResolver, applied to what the form would send (`toRequest`). Messages come
 * back under the request's paths; `toField` moves them under the boxes that hold them.
 */
export function contractResolver<V>(schema: z.ZodType, toRequest: (values: V) => unknown, toField: PathMap = samePath) {
  const resolve = schemaResolver(
    z.preprocess((v) => toRequest(v as V), schema),
    { sync: true },
  );
  return (values: V): Record<string, string> => {
    const errors: Record<string, string> = {};
    for (const [path, message] of Object.entries(resolve(values))) errors[toField(path)] ??= typeof message === 'string' ? message : 'Check this field';
    return errors;
  };
}

/**
 * The one server-error step of every form: a VALIDATION_FAILED answer puts each
 * `details.issues` message under its box. Returns true when it did, so the caller
 * shows only other codes in its alert.
 */
export function showServerFieldErrors<V>(form: UseFormReturnType<V>, error: unknown, toField: PathMap = samePath): boolean {
  if (!(error instanceof ApiError)) return false;
  const field = FIELD_CODES[error.code];
  if (field) {
    // The server read the box and refused it (e.g. a phone number no country has): its message goes under that box.
    form.setFieldError(toField(field), error.message);
    return true;
  }
  if (error.code !== 'VALIDATION_FAILED') return false;
  form.setErrors(error.fieldErrors(toField));
  return true;
}

/** Codes that are about one box of a form, and that box's request path. */
const FIELD_CODES: Partial<Record<ApiError['code'], string>> = { PHONE_INVALID: 'phone' };

// Zod-free, so pages that only show a save's failure (the owner page's payment card) load no form checks.
export { formFailure, JOB_CLOSED_MESSAGE } from './messages';
