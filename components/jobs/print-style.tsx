/** Printing is a web matter; on a device the sheet is read on screen. */
export function PrintStyle() {
  return null;
}

export function printPage(): void {}

export const canPrint = false;
