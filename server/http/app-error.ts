import type { Phrase } from '../../shared/units';

/** The one error services throw; the error middleware turns it into the API's one error shape. */
export class AppError extends Error {
  /** The message as a phrase, where it carries measured values (see ApiErrorBody). */
  words?: Phrase;

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }

  /** Carries the message's quantities too, so the reader sees them in their own units. */
  worded(words: Phrase): this {
    this.words = words;
    return this;
  }

  static badRequest(code: string, message: string, fields?: Record<string, string>) {
    return new AppError(400, code, message, fields);
  }
  static unauthorized(message = 'Sign in to continue.') {
    return new AppError(401, 'signed_out', message);
  }
  static forbidden(message = 'Your role cannot do this.') {
    return new AppError(403, 'forbidden', message);
  }
  static notFound(message = 'Not found.') {
    return new AppError(404, 'not_found', message);
  }
  static conflict(code: string, message: string, fields?: Record<string, string>) {
    return new AppError(409, code, message, fields);
  }
}
