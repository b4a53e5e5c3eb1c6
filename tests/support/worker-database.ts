// Setup file of the api project: each vitest worker uses its own copy of the migrated test database
// (`<DB_NAME>_<worker>`, made by scripts/test.mjs), so files running side by side never share rows,
// queued mails or background jobs. Without the copies (a run outside npm test) the one database is used.
const worker = Number(process.env.VITEST_POOL_ID);
const copies = Number(process.env.TEST_WORKER_DATABASES ?? 0);
const template = (process.env.TEST_TEMPLATE_DB_NAME ??= process.env.DB_NAME);
if (template && Number.isInteger(worker) && worker >= 1 && worker <= copies) process.env.DB_NAME = `${template}_${worker}`;
