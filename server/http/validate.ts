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
