// Data code that a Galera cluster can run: every write transaction goes through one retry wrapper (a real
// InnoDB deadlock between two connections is retried and both writes land once) and every table of the
// migrated schema has a primary key (Galera's row-based replication needs one: MariaDB Galera Cluster known
// limitations [S: mariadb.com/kb, "MariaDB Galera Cluster - Known Limitations"]).
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, expect, test } from 'vitest';
import { QueryTypes } from 'sequelize';
import { loadConfig } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';
import { mariadbErrno, withWriteTransaction } from '../../server/db/write-transaction.ts';

const sequelize = createSequelize(loadConfig({ ...process.env, NODE_ENV: 'test' }).db);
const tag = `galera-test-${randomBytes(4).toString('hex')}`;
const keys = [`${tag}-a`, `${tag}-b`];

beforeAll(async () => {
  await sequelize.query(
    'INSERT INTO app_meta (meta_key, meta_value, created_at, updated_at) VALUES (?, ?, NOW(), NOW()), (?, ?, NOW(), NOW())',
    { replacements: [keys[0], '', keys[1], ''] },
  );
});
afterAll(async () => {
  await sequelize.query('DELETE FROM app_meta WHERE meta_key IN (?)', { replacements: [keys] });
  await sequelize.close();
});

/** Resolves once both sides have arrived. */
function barrier(parties: number) {
  let arrived = 0;
  let open!: () => void;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return () => {
    if (++arrived === parties) open();
    return opened;
  };
}

test('when two transactions lock two rows in opposite order, then the deadlock victim is retried and each write lands exactly once', async () => {
  const meet = barrier(2);
  const retries: number[] = [];
  const attempts = { t1: 0, t2: 0 };
  const append = (key: string, who: string, transaction: Parameters<Parameters<typeof withWriteTransaction>[1]>[0]) =>
    sequelize.query("UPDATE app_meta SET meta_value = CONCAT(meta_value, '|', ?) WHERE meta_key = ?", {
      replacements: [who, key],
      transaction,
    });
  const write = (who: 't1' | 't2', first: string, second: string) =>
    withWriteTransaction(
      sequelize,
      async (transaction) => {
        attempts[who]++;
        await append(first, who, transaction);
        // Only the first attempts wait for each other: each holds its first row and asks for the other's.
        if (attempts[who] === 1) await meet();
        await append(second, who, transaction);
        return who;
      },
      { onRetry: (_n, err) => retries.push(mariadbErrno(err) ?? 0) },
    );

  const results = await Promise.all([write('t1', keys[0]!, keys[1]!), write('t2', keys[1]!, keys[0]!)]);

  expect(results).toEqual(['t1', 't2']);
  // InnoDB picked one victim (errno 1213); it ran again once and the other went through the first time.
  expect(retries).toEqual([1213]);
  expect(attempts.t1 + attempts.t2).toBe(3);
  const rows = await sequelize.query<{ meta_key: string; meta_value: string }>(
    'SELECT meta_key, meta_value FROM app_meta WHERE meta_key IN (?) ORDER BY meta_key',
    { replacements: [keys], type: QueryTypes.SELECT },
  );
  for (const row of rows) expect(row.meta_value.split('|').filter(Boolean).sort()).toEqual(['t1', 't2']);
  expect(rows).toHaveLength(2);
});

test('when the function fails for a reason a retry cannot cure, then it runs once and the error comes back unchanged', async () => {
  let runs = 0;
  const failure = new Error('not retryable');
  await expect(
    withWriteTransaction(sequelize, async (transaction) => {
      runs++;
      await sequelize.query("UPDATE app_meta SET meta_value = 'changed' WHERE meta_key = ?", { replacements: [keys[0]], transaction });
      throw failure;
    }),
  ).rejects.toBe(failure);
  expect(runs).toBe(1);
  const [row] = await sequelize.query<{ meta_value: string }>('SELECT meta_value FROM app_meta WHERE meta_key = ?', {
    replacements: [keys[0]],
    type: QueryTypes.SELECT,
  });
  expect(row!.meta_value).not.toBe('changed');
});

test('when every attempt deadlocks, then it gives up after four attempts and rethrows the deadlock', async () => {
  let runs = 0;
  const deadlock = Object.assign(new Error('Deadlock found when trying to get lock'), { parent: { errno: 1213 } });
  await expect(
    withWriteTransaction(sequelize, async () => {
      runs++;
      throw deadlock;
    }),
  ).rejects.toBe(deadlock);
  expect(runs).toBe(4);
});

test('every table of the migrated schema has a primary key', async () => {
  const tables = await sequelize.query<{ name: string; has_pk: number }>(
    `SELECT t.table_name AS name,
            EXISTS (SELECT 1 FROM information_schema.table_constraints c
                     WHERE c.table_schema = t.table_schema AND c.table_name = t.table_name
                       AND c.constraint_type = 'PRIMARY KEY') AS has_pk
       FROM information_schema.tables t
      WHERE t.table_schema = DATABASE() AND t.table_type = 'BASE TABLE'`,
    { type: QueryTypes.SELECT },
  );
  // The schema has dozens of tables (users, builds, runs, sessions, outbox, …); an empty answer would prove nothing.
  expect(tables.length).toBeGreaterThan(20);
  expect(tables.filter((t) => !Number(t.has_pk)).map((t) => t.name)).toEqual([]);
});
