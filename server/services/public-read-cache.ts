// What visitors read (build pages and cards, part pages, the exchange), cached briefly. These pages change only
// when someone writes, and every write in this app goes through Sequelize models, so universal model hooks on the
// Sequelize instance drop the whole cache on any write to a table these pages read (again after the write's
// transaction commits, so a read between the write and its commit cannot keep a stale copy). Other app instances
// see a change within TTL_MS. Only actor-independent data goes in: abilities and owner-only fields are added per request.
import { Model, type ModelStatic, type Sequelize } from 'sequelize';

const TTL_MS = 5_000;
const MAX_ENTRIES = 2000;
const READ_TABLES = new Set([
  'builds',
  'photos',
  'log_entries',
  'actuators',
  'calibration_runs',
  'parts',
  'part_photos',
  'listings',
  'listing_photos',
  'users',
]);
const WRITE_HOOKS = [
  'afterCreate',
  'afterUpdate',
  'afterSave',
  'afterDestroy',
  'afterRestore',
  'afterUpsert',
  'afterBulkCreate',
  'afterBulkUpdate',
  'afterBulkDestroy',
  'afterBulkRestore',
] as const;

const cache = new Map<string, { value: unknown; at: number; generation: number }>();
const watched = new WeakSet<Sequelize>();
let generation = 0;

/** Forget every cached public read (called by the write hooks; also for writes that bypass models). */
export function invalidatePublicReads(): void {
  generation++;
}

type HookOptions = { model?: ModelStatic<Model>; transaction?: { afterCommit(fn: () => void): void } | null };

/** The options argument of any write hook: instance hooks pass (instance, options), bulk hooks (options). */
function onWrite(...args: unknown[]): void {
  const instance = args.find((a): a is Model => a instanceof Model);
  const options =
    args.findLast((a): a is HookOptions => a !== null && typeof a === 'object' && !Array.isArray(a) && !(a instanceof Model)) ?? {};
  const model = (instance?.constructor as ModelStatic<Model> | undefined) ?? options.model;
  const table = model?.getTableName?.();
  const name = typeof table === 'string' ? table : (table as { tableName?: string } | undefined)?.tableName;
  if (name && !READ_TABLES.has(name)) return;
  invalidatePublicReads();
  options.transaction?.afterCommit(invalidatePublicReads);
}

/** Install the write hooks once per Sequelize instance. */
function watch(sequelize: Sequelize): void {
  if (watched.has(sequelize)) return;
  watched.add(sequelize);
  invalidatePublicReads(); // writes through this instance went unseen until now
  for (const hook of WRITE_HOOKS) sequelize.addHook(hook, onWrite as never);
}

/** The cached value for this key, or load it and remember it (unless a write happened while loading). */
export async function cachedPublicRead<T>(sequelize: Sequelize, key: string, load: () => Promise<T>): Promise<T> {
  watch(sequelize);
  const hit = cache.get(key);
  const now = Date.now();
  if (hit && hit.generation === generation && now - hit.at < TTL_MS) return hit.value as T;
  const seen = generation;
  const value = await load();
  if (seen === generation) {
    if (cache.size >= MAX_ENTRIES) cache.delete(cache.keys().next().value!);
    cache.set(key, { value, at: now, generation: seen });
  }
  return value;
}
