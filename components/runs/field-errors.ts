import type { FieldErrors } from 'react-hook-form';

export type FieldMessages = Record<string, string>;

/** react-hook-form's nested errors as "segments.0.lengthMm" → message. */
export function flattenErrors(errors: FieldErrors, prefix = ''): FieldMessages {
  const out: FieldMessages = {};
  for (const [key, value] of Object.entries(errors)) {
    if (!value || typeof value !== 'object' || key === 'ref' || key === 'types') continue;
    const path = prefix ? `${prefix}.${key}` : key;
    const message = (value as { message?: unknown }).message;
    if (typeof message === 'string' && message) out[path] = message;
    Object.assign(out, flattenErrors(value as FieldErrors, path));
  }
  return out;
}

/** The first message of several sources, in order of priority. */
export function mergeMessages(...sources: FieldMessages[]): FieldMessages {
  const out: FieldMessages = {};
  for (const source of sources) {
    for (const [path, message] of Object.entries(source)) if (!(path in out)) out[path] = message;
  }
  return out;
}
