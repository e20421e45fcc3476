import { useEffect } from 'react';

/**
 * While the sheet is open, a print stylesheet hides the app's navigation (everything beside the
 * main region), lets the scrolling page run over as many A4 or Letter pages as it needs, and
 * hides the on-screen controls marked with the `print-hide` id prefix.
 */
const CSS = `
@media print {
  @page { size: auto; margin: 12mm; }
  html, body, #root { height: auto !important; overflow: visible !important; background: #fff !important; }
  *:has(> [role="main"]) > *:not([role="main"]) { display: none !important; }
  *:has(> [role="main"]), [role="main"], [role="main"] * { overflow: visible !important; }
  *:has(> [role="main"]), [role="main"], [role="main"] > * { height: auto !important; max-height: none !important; flex: none !important; }
  [id^="print-hide"] { display: none !important; }
  #job-sheet { max-width: none !important; }
  #job-sheet [role="article"] { break-inside: avoid; }
}
`;

export function PrintStyle() {
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-dilato', 'job-sheet-print');
    style.textContent = CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  return null;
}

export function printPage(): void {
  window.print();
}

export const canPrint = true;
