import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from '../../hooks/api-client';

/** Puts each of the server's field messages (`uns`, `cte.1.meanUmPerMK`) under its field. */
export function placeServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>): void {
  const fields = isApiError(error) ? error.fields : {};
  for (const [path, message] of Object.entries(fields)) setError(path as Path<T>, { type: 'server', message });
}
