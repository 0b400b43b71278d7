import { applyDecorators, type PipeTransform } from '@nestjs/common';
import { ApiBody, ApiQuery } from '@nestjs/swagger';
import { z } from 'zod';
import { DomainError } from './domain-error';

/** Validates a body, query or param with a contracts schema; failures list each field. */
export class ZodPipe<S extends z.ZodType> implements PipeTransform<unknown, z.infer<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.infer<S> {
    const parsed = this.schema.safeParse(value);
    if (parsed.success) return parsed.data;
    const issues = parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    throw new DomainError('VALIDATION_FAILED', issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; '), { issues });
  }
}

export const zod = <S extends z.ZodType>(schema: S): ZodPipe<S> => new ZodPipe(schema);

type OpenApiSchema = Parameters<typeof ApiBody>[0] extends infer O ? (O extends { schema?: infer X } ? X : never) : never;

function toOpenApi(schema: z.ZodType): OpenApiSchema {
  return z.toJSONSchema(schema, { target: 'openapi-3.0', io: 'input', unrepresentable: 'any' }) as OpenApiSchema;
}

/** Documents a JSON request body in the OpenAPI document from its contracts schema. */
export const ApiZodBody = (schema: z.ZodType): MethodDecorator => ApiBody({ schema: toOpenApi(schema) });

/** Documents each field of a query-string schema as a query parameter. */
export function ApiZodQuery(schema: z.ZodObject): MethodDecorator {
  const props = (toOpenApi(schema) as { properties?: Record<string, OpenApiSchema> }).properties ?? {};
  return applyDecorators(...Object.entries(props).map(([name, s]) => ApiQuery({ name, required: false, schema: s })));
}
