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

// The browser's Back and Forward cannot be cancelled; the guard answers a refused one by stepping
// straight back. Every history entry the app makes carries its position, so the step knows its
// direction, and the router never hears of either step: this listener is on the window before the
// router's (the module loads with the root layout) and stops the event there.
const POSITION = 'dilatoPosition';
let position = Number((window.history.state as Record<string, unknown> | null)?.[POSITION] ?? 0);
// A step the app asks for that the browser cannot take fires no event, so each is expected briefly.
let appStepsUntil: number[] = [];
let stepsToSwallow = 0;

function stamped(state: unknown, at: number): unknown {
  return state !== null && typeof state === 'object' ? { ...state, [POSITION]: at } : { [POSITION]: at };
}

const { pushState, replaceState, go } = window.history;
window.history.pushState = function (state, unused, url) {
  position += 1;
  pushState.call(this, stamped(state, position), unused, url);
};
window.history.replaceState = function (state, unused, url) {
  replaceState.call(this, stamped(state, position), unused, url);
};
// The router's own back (after a save, or a Cancel button) goes through here and is not asked about.
window.history.go = function (delta) {
  if (delta) appStepsUntil.push(Date.now() + 1000);
  go.call(this, delta);
};

function onPopState(event: PopStateEvent) {
  const reached = Number((event.state as Record<string, unknown> | null)?.[POSITION] ?? 0);
  if (stepsToSwallow > 0) {
    stepsToSwallow -= 1;
    position = reached;
    event.stopImmediatePropagation();
    return;
  }
  appStepsUntil = appStepsUntil.filter((until) => until > Date.now());
  if (appStepsUntil.length > 0) {
    appStepsUntil.shift();
  } else if (dirtyForms.size > 0 && reached !== position && !window.confirm(LEAVE_QUESTION)) {
    event.stopImmediatePropagation();
    stepsToSwallow += 1;
    go.call(window.history, position - reached);
    return;
  }
  position = reached;
}
window.addEventListener('popstate', onPopState);

let listening = false;
function listen() {
  if (listening) return;
  listening = true;
  window.addEventListener('beforeunload', onBeforeUnload);
  document.addEventListener('click', onClick, true);
}

/** While `dirty`, tapping a link to another screen or the browser's Back asks first, and the browser warns on close or reload. */
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
