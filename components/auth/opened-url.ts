/**
 * The address the page was first loaded at, read when this module is first evaluated (app start).
 * While the signed-in screens wait for the session, the router may already have rewritten the
 * address of a screen nested in the tabs (to "/?id=…"), so the link to come back to is taken from here.
 */
let opened: string | null = typeof window !== 'undefined' && window.location ? `${window.location.pathname}${window.location.search}` : null;

/** The first address once (for the first redirect to sign-in, or dropped once signed in); null afterwards. */
export function takeOpenedUrl(): string | null {
  const url = opened;
  opened = null;
  return url;
}
