import { useEffect } from 'react';
import { screenTitle } from './screen-title';

export { screenTitle };

/** Sets the browser tab's title while the screen is shown, so tabs and history read apart. */
export function useScreenTitle(...parts: (string | null | undefined)[]): void {
  const title = screenTitle(parts);
  useEffect(() => {
    document.title = title;
  }, [title]);
}
