// The registry's read pool must survive a database that stays away: its queries fail (and map to
// 503), but the driver's background connection errors must not crash the process.
import { afterAll, expect, test } from 'vitest';
import { createServer, type AddressInfo } from 'node:net';
import { setTimeout as sleep } from 'node:timers/promises';
import { Sequelize } from 'sequelize';
import { closeReadPool, readPool } from '../../server/db/read-pool.ts';

const unusedPort = () =>
  new Promise<number>((resolve) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as AddressInfo;
      srv.close(() => resolve(port));
    });
  });

const sequelize = new Sequelize('nothing', 'nobody', 'x', {
  host: '127.0.0.1',
  port: await unusedPort(),
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
    const err = await readPool(sequelize)
      .query('SELECT 1')
      .then(
        () => null,
        (e: { code?: string }) => e,
      );
    expect(err?.code).toMatch(/ER_GET_CONNECTION_TIMEOUT|ECONNREFUSED/);
    await sleep(1500); // past the 3 s connection budget, when the driver emits its background error
    expect(crashes).toEqual([]);
  } finally {
    process.off('uncaughtException', onCrash);
  }
}, 20_000);
