// Ties the first row a request creates to its Idempotency-Key claim inside the same transaction. The
// middleware runs the rest of the request inside `idempotencyScope`; a universal afterCreate hook on the
// Sequelize instance writes `applied_resource` on the claim with the creating query's own transaction, so
// the mark commits or rolls back with the write itself. A retry after a crash between the commit and the
// stored answer then knows the write happened (no second row) instead of guessing.
import { AsyncLocalStorage } from 'node:async_hooks';
import type { CreateOptions, Model, Sequelize } from 'sequelize';

interface Scope {
  claimId: number;
  marked: boolean;
}

const storage = new AsyncLocalStorage<Scope>();
const hooked = new WeakSet<Sequelize>();

/** Runs `fn` (the rest of the request) with its claim in scope. */
export function idempotencyScope<T>(claimId: number, fn: () => T): T {
  return storage.run({ claimId, marked: false }, fn);
}

/** Installs the afterCreate hook once per Sequelize instance. */
export function watchIdempotentCreates(sequelize: Sequelize): void {
  if (hooked.has(sequelize)) return;
  hooked.add(sequelize);
  sequelize.addHook('afterCreate', async (instance: Model, options: CreateOptions) => {
    const scope = storage.getStore();
    const table = (instance.constructor as typeof Model).getTableName();
    if (!scope || scope.marked || table === 'idempotency_keys') return;
    scope.marked = true;
    const id = (instance.get('id') as number | undefined) ?? 0;
    await sequelize.query('UPDATE idempotency_keys SET applied_resource = ? WHERE id = ? AND applied_resource IS NULL', {
      replacements: [`${String(table)}:${id}`, scope.claimId],
      ...(options.transaction ? { transaction: options.transaction } : {}),
    });
  });
}
