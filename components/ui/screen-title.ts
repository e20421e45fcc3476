/** The browser tab's words for a screen: "Run 1 · Hill-climb downpipe · Dilato". */
export function screenTitle(parts: readonly (string | null | undefined)[]): string {
  return [...parts.filter((p): p is string => Boolean(p && p.trim())), 'Dilato'].join(' · ');
}
