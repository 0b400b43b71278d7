import { applyDecorators, Body, type PipeTransform, Param, Query } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiParam, ApiQuery } from '@nestjs/swagger';
import { z } from 'zod';
import { DomainError } from './domain-error';

/** Validates a value with a contracts schema; failures list each field (400 VALIDATION_FAILED through the one filter). */
export class ZodPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.infer<S> {
    const parsed = this.schema.safeParse(value);
    if (parsed.success) return parsed.data;
    const issues = parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    throw new DomainError('VALIDATION_FAILED', issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; '), { issues });
  }
}

/** The schema shape `@ApiParam` takes (a plain schema object; it is also what `@ApiBody`/`@ApiQuery` accept). */
type OpenApiSchema = Parameters<typeof ApiParam>[0] extends infer O ? (O extends { schema?: infer X } ? NonNullable<X> : never) : never;

function toOpenApi(schema: z.ZodType): OpenApiSchema {
  return z.toJSONSchema(schema, { target: 'openapi-3.0', io: 'input', unrepresentable: 'any' }) as OpenApiSchema;
}

/**
 * Applies a method decorator from inside a parameter decorator: TypeScript runs a method's
 * parameter decorators before its method decorators, on the same function object, so the
 * OpenAPI metadata lands exactly where `@ApiBody()` above the method would put it.
 */
function onMethod(target: object, key: string | symbol | undefined, decorator: MethodDecorator): void {
  if (key === undefined) throw new Error('A request schema decorator belongs on a route handler parameter');
  const descriptor = Object.getOwnPropertyDescriptor(target, key);
  if (!descriptor) throw new Error(`No handler ${String(key)} to document`);
  decorator(target, key, descriptor);
}

/**
 * The request body, validated with its contracts schema and documented in the OpenAPI
 * document from the same schema: `@ZodBody(BookInRequestSchema) body: BookInRequest`.
 */
export const ZodBody =
  (schema: z.ZodType): ParameterDecorator =>
  (target, key, index) => {
    Body(new ZodPipe(schema))(target, key, index);
    onMethod(target, key, ApiBody({ schema: toOpenApi(schema) }));
  };

/** The query string, validated as a whole; each field of the schema is documented as an optional query parameter. */
export const ZodQuery =
  (schema: z.ZodObject): ParameterDecorator =>
  (target, key, index) => {
    Query(new ZodPipe(schema))(target, key, index);
    const props = (toOpenApi(schema) as { properties?: Record<string, OpenApiSchema> }).properties ?? {};
    for (const [name, s] of Object.entries(props)) onMethod(target, key, ApiQuery({ name, required: false, schema: s }));
  };

/** One path segment, validated and documented (e.g. an enum of variants): `@ZodParam('variant', MediaVariantSchema)`. */
export const ZodParam =
  (name: string, schema: z.ZodType): ParameterDecorator =>
  (target, key, index) => {
    Param(name, new ZodPipe(schema))(target, key, index);
    onMethod(target, key, ApiParam({ name, schema: toOpenApi(schema) }));
  };

/**
 * Documents a multipart form: its file field (`many`: several files) plus the text fields of a contracts schema.
 * Those fields arrive with the files, so the service validates them with `ZodPipe` after multer, where it can
 * still discard the files it was sent; the form's description is never written out by hand.
 */
export function ApiZodForm(file: { field: string; many?: boolean }, fields?: z.ZodObject): MethodDecorator {
  const binary = { type: 'string' as const, format: 'binary' };
  const form = (fields ? toOpenApi(fields) : {}) as { properties?: Record<string, OpenApiSchema>; required?: string[] };
  const schema = {
    type: 'object' as const,
    required: [file.field, ...(form.required ?? [])],
    properties: { [file.field]: file.many ? { type: 'array' as const, items: binary } : binary, ...form.properties },
  };
  return applyDecorators(ApiConsumes('multipart/form-data'), ApiBody({ schema }));
}
