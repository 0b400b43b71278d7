import { z } from 'zod';

/** Database id in a JSON body: a positive integer. */
export const IdSchema = z.int().positive();
export type Id = z.infer<typeof IdSchema>;

/** Database id from a path or query string ("42" → 42). */
export const IdParamSchema = z.coerce.number().int().positive();

/** Calendar date "yyyy-mm-dd" (ISO 8601). */
export const IsoDateSchema = z.iso.date();

/** Timestamp as sent by the api: ISO 8601 with Z or an offset. */
export const IsoDateTimeSchema = z.iso.datetime({ offset: true });

/** Required one-line text, trimmed. */
export const requiredText = (max: number) => z.string().trim().min(1, 'Required').max(max);

/** Optional text, trimmed: undefined, null and "" all become null. */
export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .nullish()
    .transform((v) => (v ? v : null));

/** E-mail, trimmed and lower-cased. */
export const EmailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address'));

/** Optional e-mail: may be left empty, but must be valid when given. Empty becomes null. */
export const OptionalEmailSchema = z
  .union([z.literal(''), EmailSchema])
  .nullish()
  .transform((v) => (v ? v : null));

export const SORT_ORDERS = ['asc', 'desc'] as const;
export const SortOrderSchema = z.enum(SORT_ORDERS);

/** Search text from a query string; empty means no search. */
const SearchSchema = z
  .string()
  .trim()
  .max(200)
  .optional()
  .transform((v) => (v ? v : undefined));

/**
 * Paging query for a list endpoint, coerced from query-string text:
 * page ≥ 1 (default 1), pageSize 1–100 (default 20), sort one of
 * `sortFields` (default the first), order asc/desc (default asc), q search.
 */
export function pagingQuerySchema<const S extends readonly [string, ...string[]]>(sortFields: S) {
  return z.object({
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(100).default(20),
    sort: z.enum(sortFields).default(sortFields[0] as S[number] & string),
    order: SortOrderSchema.default('asc'),
    q: SearchSchema,
  });
}

/** A page of items with the total count across all pages. */
export function pagedSchema<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.int().nonnegative(),
    page: z.int().min(1),
    pageSize: z.int().min(1).max(100),
  });
}

export interface Paged<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A query-string list: "a,b" or repeated keys (?status=a&status=b). */
export function queryList<T extends z.ZodType>(item: T) {
  return z.preprocess((v) => (typeof v === 'string' ? v.split(',').filter((s) => s.length > 0) : v), z.array(item));
}
