// Apply (or with `down`, revert one) migration against the configured database.
import { loadConfig } from '../config.ts';
import { createSequelize } from '../db/sequelize.ts';
import { createMigrator } from '../db/migrator.ts';

const sequelize = createSequelize(loadConfig().db);
const migrator = createMigrator(sequelize);
const done = process.argv[2] === 'down' ? await migrator.down() : await migrator.up();
if (done.length)
  process.stdout.write(`Migrations ${process.argv[2] === 'down' ? 'reverted' : 'applied'}: ${done.map((m) => m.name).join(', ')}\n`);
await sequelize.close();
