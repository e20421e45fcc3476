import type { z } from 'zod';
import { AppError } from './app-error';

/** Turns zod issues into `{ "segments.0.lengthMm": "message" }`, the first message per path. */
export function fieldsFromZod(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

export function parseBody<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  const result = schema.safeParse(body ?? {});
  if (!result.success) {
    throw AppError.badRequest('invalid_input', 'Some values need attention.', fieldsFromZod(result.error));
  }
  return result.data;
}
