import { afterEach, describe, expect, test, vi } from 'vitest';
import { QueryClient, isCancelledError } from '@tanstack/react-query';
import { notificationQueries } from '../../src/features/notifications/api/notifications.ts';
import { partQueries } from '../../src/lib/part-queries.ts';

/** A stand-in for the browser's fetch that, like it, rejects with an AbortError once the request's signal fires. */
function pendingFetch() {
  const signals: (AbortSignal | undefined)[] = [];
  const fetch = vi.fn((_path: string, init?: RequestInit) => {
    signals.push(init?.signal ?? undefined);
    return new Promise<Response>((_resolve, reject) => {
      init?.signal?.addEventListener('abort', () => reject(new DOMException('The operation was aborted.', 'AbortError')));
    });
  });
  vi.stubGlobal('fetch', fetch);
  return signals;
}

afterEach(() => void vi.unstubAllGlobals());

// The queries' own options from src/, run by TanStack Query's client (no React, no network).
describe('a read that is cancelled', () => {
  test('when a signed-in read in flight is cancelled (sign-out after waiting 5 s for it), then its request is aborted, not left to come back 401', async () => {
    const signals = pendingFetch();
    const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const read = qc.fetchQuery(notificationQueries.counts()).catch((e: unknown) => e);
    await vi.waitFor(() => expect(signals).toHaveLength(1));
    expect(signals[0]?.aborted).toBe(false);
    await qc.cancelQueries({ predicate: (q) => q.queryKey[0] !== 'session' });
    expect(signals[0]?.aborted).toBe(true);
    expect(isCancelledError(await read)).toBe(true);
  });

  test('when a registry page is left while its read is in flight, then the read is aborted', async () => {
    const signals = pendingFetch();
    const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    void qc.fetchQuery(partQueries.detail(7)).catch(() => undefined);
    await vi.waitFor(() => expect(signals).toHaveLength(1));
    await qc.cancelQueries({ queryKey: partQueries.all });
    expect(signals[0]?.aborted).toBe(true);
  });
});
