// Before serving: apply pending migrations, then seed the demo scenario on the first run only.
import { loadConfig } from '../config.ts';
import { createSequelize } from '../db/sequelize.ts';
import { createMigrator } from '../db/migrator.ts';
import { initModels } from '../models/index.ts';
import { seedDemoOnce } from '../db/seed/demo.ts';
import { demoPictureAttacher } from '../db/seed/demo-pictures.ts';
import { createPhotoStore } from '../storage/create-photo-store.ts';

const config = loadConfig();
const sequelize = createSequelize(config.db);
const applied = await createMigrator(sequelize).up();
if (applied.length) process.stdout.write(`Applied ${applied.length} migration(s).\n`);
initModels(sequelize);
const photos = await createPhotoStore(config);
const seeded = await seedDemoOnce(sequelize, demoPictureAttacher(photos));
if (seeded) process.stdout.write('Seeded the demo scenario (first run).\n');
await sequelize.close();
await photos.close();
