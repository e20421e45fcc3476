import type { Phrase } from '../units';

/** The one error shape of the whole API. */
export interface ApiErrorBody {
  error: {
    code: string;
    /** The message in SI units, for any client. */
    message: string;
    fields?: Record<string, string>;
    /** The same message as words and quantities, where it carries measured values, so a client words it in its reader's units. */
    words?: Phrase;
  };
}
