/**
 * A designation as a plain sortable string: lower case, every run of digits padded to ten places,
 * so that ordinary string order in any database gives "Type 304" before "Type 2205".
 */
export function designationKey(designation: string): string {
  return designation
    .trim()
    .toLowerCase()
    .replace(/\d+/g, (digits) => digits.padStart(10, '0'));
}

/** Text as the alloy search compares it: lower case, without spaces or hyphens ("Type-321 H" → "type321h"). */
export function squashed(text: string): string {
  return text.toLowerCase().replace(/[\s-]/g, '');
}

/** What a version is found by: its squashed designation and UNS number, kept apart by a newline no search can contain. */
export function searchText(designation: string, uns: string): string {
  return `${squashed(designation)}\n${squashed(uns)}`;
}
