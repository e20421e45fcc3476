import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError, messageOf } from '../../hooks/api-client';

/**
 * Puts the server's field messages (`options.1.alloyId`, `marginPct` …) under their fields and
 * returns the line for the banner above the save button.
 */
export function placeServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>): string {
  const fields = Object.entries(isApiError(error) ? error.fields : {});
  for (const [path, message] of fields) setError(path as Path<T>, { type: 'server', message });
  return fields.length > 0 ? 'Some values need attention: see the messages under the fields.' : messageOf(error);
}
