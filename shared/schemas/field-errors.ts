import type { z } from 'zod';

/** zod issues as the API's `fields`: "segments.0.lengthMm" → the first message for that path. */
export function fieldsFromZodError(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const path = issue.path.map(String).join('.') || '_';
    if (!(path in fields)) fields[path] = issue.message;
  }
  return fields;
}
