/** Lets every pending request and timer run before going on. */
export const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Long work on the one JavaScript thread stays in slices this short, so other requests wait at most about this long. */
export const SLICE_MS = 8;

/**
 * Cuts a long loop into slices: `due()` says when the current slice has used its time,
 * `pause()` yields to the event loop and starts the next slice.
 */
export class TimeSlicer {
  private start = performance.now();

  constructor(private readonly sliceMs = SLICE_MS) {}

  due(): boolean {
    return performance.now() - this.start >= this.sliceMs;
  }

  async pause(): Promise<void> {
    await yieldToEventLoop();
    this.start = performance.now();
  }

  async maybePause(): Promise<void> {
    if (this.due()) await this.pause();
  }
}
