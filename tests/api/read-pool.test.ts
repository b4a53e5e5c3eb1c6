// The registry's read pool must survive a database that stays away: its queries fail (and map to
// 503), but the driver's background connection errors must not crash the process.
import { afterAll, expect, test } from 'vitest';
import { errorMonitor, type EventEmitter } from 'node:events';
import { Sequelize } from 'sequelize';
import { closeReadPool, readPool } from '../../server/db/read-pool.ts';
import { freePort } from '../../scripts/lib/scratch.mjs';

const sequelize = new Sequelize('nothing', 'nobody', 'x', {
  host: '127.0.0.1',
  port: await freePort(), // nothing listens there
  dialect: 'mariadb',
  logging: false,
});
afterAll(async () => {
  await closeReadPool(sequelize);
  await sequelize.close();
});

test('when nothing answers on the database port for longer than a connection attempt may take, then queries fail with a connection error and the process lives on', async () => {
  const crashes: unknown[] = [];
  const onCrash = (err: unknown) => crashes.push(err);
  process.on('uncaughtException', onCrash);
  try {
    const pool = readPool(sequelize);
    // errorMonitor sees the driver's background 'error' event without counting as a listener, so an
    // unhandled emit would still throw (and show up in `crashes`).
    const backgroundError = new Promise<unknown>((resolve) => (pool as unknown as EventEmitter).once(errorMonitor, resolve));
    const err = await pool.query('SELECT 1').then(
      () => null,
      (e: { code?: string }) => e,
    );
    expect(err?.code).toMatch(/ER_GET_CONNECTION_TIMEOUT|ECONNREFUSED/);
    expect(await backgroundError).toMatchObject({
      code: expect.stringMatching(/ER_GET_CONNECTION_TIMEOUT|ECONNREFUSED|ER_CONNECTION_TIMEOUT/),
    });
    // An exception thrown by that emit reaches 'uncaughtException' before the next turn of the event loop.
    await new Promise((resolve) => setImmediate(resolve));
    expect(crashes).toEqual([]);
  } finally {
    process.off('uncaughtException', onCrash);
  }
}, 20_000);
