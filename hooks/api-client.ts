import type { ApiErrorBody } from '../shared/schemas/api-error';
import { wordPhrase, type Phrase, type UnitSystem } from '../shared/units';

/** Every way a request can fail, reduced to what the UI needs to decide what to show. */
export type ApiFailureKind =
  | 'signed_out'
  | 'forbidden'
  | 'not_found'
  | 'invalid'
  | 'conflict'
  | 'rate_limited'
  | 'offline'
  | 'server';

export class ApiError extends Error {
  readonly kind: ApiFailureKind;
  readonly status: number;
  /** The server's snake_case code, when it sent one (e.g. `email_taken`, `last_admin`). */
  readonly code: string | undefined;
  readonly fields: Record<string, string>;
  /** The message as words and quantities, when the server sent them. */
  words?: Phrase;

  constructor(kind: ApiFailureKind, message: string, status = 0, code?: string, fields: Record<string, string> = {}) {
    super(message);
    this.name = 'ApiError';
    this.kind = kind;
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

const fallbackMessages: Record<ApiFailureKind, string> = {
  signed_out: 'Your session has ended. Sign in again.',
  forbidden: 'Your role does not allow this.',
  not_found: 'That could not be found.',
  invalid: 'Some of the details need correcting.',
  conflict: 'That clashes with something that already exists.',
  rate_limited: 'Too many attempts. Wait a little and try again.',
  offline: 'Dilato cannot reach the server. Check the connection and try again.',
  server: 'Something went wrong on the server. Try again in a moment.',
};

function kindFor(status: number): ApiFailureKind {
  if (status === 401) return 'signed_out';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'not_found';
  if (status === 409) return 'conflict';
  if (status === 429) return 'rate_limited';
  if (status === 400 || status === 422) return 'invalid';
  return 'server';
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const inner = (value as { error: unknown }).error;
  return typeof inner === 'object' && inner !== null && typeof (inner as { message?: unknown }).message === 'string';
}

/** A readable message for any thrown value, for banners. */
export function messageOf(error: unknown, units: UnitSystem = 'metric'): string {
  if (isApiError(error)) return error.words ? wordPhrase(error.words, units) : error.message;
  return fallbackMessages.server;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

async function request<T>(method: Method, path: string, body?: unknown): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: 'include',
      headers: body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError('offline', fallbackMessages.offline);
  }

  if (response.status === 204) return undefined as T;

  let payload: unknown = undefined;
  const text = await response.text();
  if (text) {
    try {
      payload = JSON.parse(text);
    } catch {
      payload = undefined;
    }
  }

  if (response.ok) return payload as T;
  throw failureFor(response.status, payload);
}

function failureFor(status: number, payload: unknown): ApiError {
  // A refused upload (too large, not a PDF) is something the person can correct.
  const kind = status === 413 || status === 415 ? 'invalid' : kindFor(status);
  if (isErrorBody(payload)) {
    const { code, message, fields, words } = payload.error;
    const failure = new ApiError(kind, message || fallbackMessages[kind], status, code, fields ?? {});
    if (Array.isArray(words)) failure.words = words;
    return failure;
  }
  return new ApiError(kind, fallbackMessages[kind], status);
}

export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

export interface SendOptions {
  /** Sent as Content-Type; leave unset for FormData so the browser adds the multipart boundary. */
  contentType?: string;
  /** Fraction of the body sent so far, 0 to 1. */
  onProgress?: (fraction: number) => void;
  /** Aborting stops the upload; the promise rejects with an `UploadCancelled`. */
  signal?: AbortSignal;
}

/** What a cancelled upload rejects with, so callers can tell it from a failure. */
export class UploadCancelled extends Error {
  constructor() {
    super('The upload was cancelled.');
    this.name = 'UploadCancelled';
  }
}

/** POST a file or raw text through XMLHttpRequest, which (unlike fetch) reports upload progress. */
export function send<T>(path: string, body: FormData | string, { contentType, onProgress, signal }: SendOptions = {}): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    if (signal?.aborted) return reject(new UploadCancelled());
    const xhr = new XMLHttpRequest();
    xhr.onabort = () => reject(new UploadCancelled());
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    if (contentType) xhr.setRequestHeader('Content-Type', contentType);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && onProgress) onProgress(event.loaded / event.total);
    };
    xhr.onerror = () => reject(new ApiError('offline', fallbackMessages.offline));
    xhr.onload = () => {
      let payload: unknown = undefined;
      try {
        payload = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        payload = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(payload as T);
      else reject(failureFor(xhr.status, payload));
    };
    xhr.send(body);
  });
}

/** Only failures that might pass on their own are worth repeating. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= 2) return false;
  return !isApiError(error) || error.kind === 'offline' || error.kind === 'server';
}
