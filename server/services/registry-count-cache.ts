// Totals of registry searches, cached briefly. Counting a wide nm/V range walks every matching
// index entry (≈ 3 ms at 100 k parts, most of a search's cost), while the registry changes only
// when a moderator decides something. Local changes invalidate at once; other app instances see a
// new total within TTL_MS.
const TTL_MS = 10_000;
const MAX_ENTRIES = 1000;
const cache = new Map<string, { total: number; at: number; generation: number }>();
let generation = 0;

/** Forget every cached total (call after anything that changes which parts match a search). */
export function invalidateRegistryCounts(): void {
  generation++;
}

/** The cached total for this search, or count it and remember it. */
export async function cachedRegistryCount(key: string, count: () => Promise<number>): Promise<number> {
  const hit = cache.get(key);
  const now = Date.now();
  if (hit && hit.generation === generation && now - hit.at < TTL_MS) return hit.total;
  const seen = generation;
  const total = await count();
  if (cache.size >= MAX_ENTRIES) cache.delete(cache.keys().next().value!);
  cache.set(key, { total, at: now, generation: seen });
  return total;
}
