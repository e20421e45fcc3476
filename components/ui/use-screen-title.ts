export { screenTitle } from './screen-title';

/** Native apps show no tab title; the web sibling sets the document's. */
export function useScreenTitle(..._parts: (string | null | undefined)[]): void {}
