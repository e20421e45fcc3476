import { useEffect, useState } from 'react';

/**
 * `value` as it was one frame ago: it takes a new value in the task after the next paint, so work that
 * renders from it (a chart) stays out of the frame that shows the edit. A newer value before then
 * replaces the older one, which is never rendered.
 */
export function useAfterPaint<T>(value: T): T {
  const [shown, setShown] = useState(value);
  useEffect(() => {
    if (Object.is(shown, value)) return undefined;
    let timer: ReturnType<typeof setTimeout> | undefined;
    // Where there are no frames (tests, native without a display loop) the value follows in the next task.
    const frame = typeof requestAnimationFrame === 'function' ? requestAnimationFrame(() => (timer = setTimeout(() => setShown(value), 0))) : undefined;
    if (frame === undefined) timer = setTimeout(() => setShown(value), 0);
    return () => {
      if (frame !== undefined) cancelAnimationFrame(frame);
      if (timer !== undefined) clearTimeout(timer);
    };
  }, [value, shown]);
  return shown;
}
