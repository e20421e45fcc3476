import type { z } from 'zod';
import { fieldsFromZodError } from '../../shared/schemas/field-errors';
import { AppError } from './app-error';

export { fieldsFromZodError as fieldsFromZod };

export function parseBody<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  const result = schema.safeParse(body ?? {});
  if (!result.success) {
    throw AppError.badRequest('invalid_input', 'Some values need attention.', fieldsFromZodError(result.error));
  }
  return result.data;
}

/** A query string, refused with 400 `invalid_query` and a message per parameter. */
export function parseQuery<S extends z.ZodType>(schema: S, query: unknown): z.output<S> {
  const parsed = schema.safeParse(query);
  if (!parsed.success) throw AppError.badRequest('invalid_query', 'Some filters are not valid.', fieldsFromZodError(parsed.error));
  return parsed.data;
}

/**
 * A PATCH body: parsed like any other, then cut down to the top-level fields the request named,
 * so that defaults in the schema (e.g. `active: true`) never reset what the caller left out.
 */
export function parsePatch<S extends z.ZodType>(schema: S, body: unknown): Partial<z.output<S>> {
  const parsed = parseBody(schema, body) as Record<string, unknown>;
  const named = typeof body === 'object' && body !== null ? new Set(Object.keys(body)) : new Set<string>();
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => named.has(key))) as Partial<z.output<S>>;
}
