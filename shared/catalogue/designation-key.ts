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
