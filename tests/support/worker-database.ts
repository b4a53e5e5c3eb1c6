// Setup file of the api and browser projects: each vitest worker uses its own copy of the migrated test database
// (`<DB_NAME>_<worker>` for api and `<DB_NAME>_browser_<worker>` for browser, named by the project's
// TEST_WORKER_DATABASE_GROUP; made by scripts/test.mjs),
// so files running side by side never share rows, queued mails or background jobs. A browser worker also gets its own
// uploads folder for the demo pictures. Without the copies (a run outside npm test) the one database is used.
import { join } from 'node:path';

const worker = Number(process.env.VITEST_POOL_ID);
const copies = Number(process.env.TEST_WORKER_DATABASES ?? 0);
const template = (process.env.TEST_TEMPLATE_DB_NAME ??= process.env.DB_NAME);
const group = process.env.TEST_WORKER_DATABASE_GROUP;
const stem = group ? `${template}_${group}` : template;
if (template && Number.isInteger(worker) && worker >= 1 && worker <= copies) {
  process.env.DB_NAME = `${stem}_${worker}`;
  const uploads = (process.env.TEST_UPLOADS_BASE ??= process.env.TEST_UPLOADS_DIR);
  if (uploads) process.env.TEST_UPLOADS_DIR = join(uploads, String(worker));
}
