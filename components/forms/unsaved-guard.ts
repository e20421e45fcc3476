export { LEAVE_QUESTION } from './unsaved-guard-words';

/**
 * Native has no browser close or link clicks to catch; the web sibling (unsaved-guard.web.ts)
 * does the work where Dilato runs today.
 */
export function useUnsavedGuard(_dirty: boolean): void {}
