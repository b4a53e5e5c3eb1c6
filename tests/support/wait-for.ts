// Wait on a condition instead of sleeping a fixed time: poll until `condition` returns something truthy,
// bounded by a timeout that fails the test with what was awaited.

export interface WaitForOptions {
  /** Give up after this long (default 5 s). */
  timeoutMs?: number;
  /** Time between polls (default 20 ms). */
  intervalMs?: number;
  /** What is awaited, for the timeout message. */
  what?: string;
}

/** Resolve with the first truthy value `condition` returns; reject when `timeoutMs` passes first. */
export async function waitFor<T>(condition: () => T | Promise<T>, opts: WaitForOptions = {}): Promise<NonNullable<T>> {
  const { timeoutMs = 5000, intervalMs = 20, what = 'the condition' } = opts;
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await condition();
    if (value) return value as NonNullable<T>;
    if (Date.now() >= deadline) throw new Error(`waited ${timeoutMs} ms for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, intervalMs));
  }
}
