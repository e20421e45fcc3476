import { useEffect } from 'react';
import { LEAVE_QUESTION } from './unsaved-guard-words';

export { LEAVE_QUESTION };

/** Forms on screen with edits not saved; while any is here, leaving asks first. */
const dirtyForms = new Set<symbol>();

function onBeforeUnload(event: BeforeUnloadEvent) {
  if (dirtyForms.size === 0) return;
  // The browser shows its own wording for a close or reload; both calls are needed across browsers.
  event.preventDefault();
  event.returnValue = '';
}

/** A click that would take the app to another screen: same origin, another path, plain left click. */
function leavingLink(event: MouseEvent): boolean {
  if (event.defaultPrevented || event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return false;
  const anchor = (event.target as Element | null)?.closest?.('a[href]') as HTMLAnchorElement | null;
  if (!anchor || (anchor.target && anchor.target !== '_self')) return false;
  const to = new URL(anchor.href, window.location.href);
  if (to.origin !== window.location.origin) return false;
  return to.pathname !== window.location.pathname || to.search !== window.location.search;
}

// Capture on the document runs before React's own listener on its root, so a refused
// navigation never reaches the router.
function onClick(event: MouseEvent) {
  if (dirtyForms.size === 0 || !leavingLink(event)) return;
  if (window.confirm(LEAVE_QUESTION)) return;
  event.preventDefault();
  event.stopImmediatePropagation();
}

let listening = false;
function listen() {
  if (listening) return;
  listening = true;
  window.addEventListener('beforeunload', onBeforeUnload);
  document.addEventListener('click', onClick, true);
}

/** While `dirty`, tapping a link to another screen asks first and the browser warns on close or reload. */
export function useUnsavedGuard(dirty: boolean): void {
  useEffect(() => {
    if (!dirty) return undefined;
    listen();
    const id = Symbol('form');
    dirtyForms.add(id);
    return () => {
      dirtyForms.delete(id);
    };
  }, [dirty]);
}
