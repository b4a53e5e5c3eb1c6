// `npm run bench:pages`: what each page costs a visitor in headless Chromium on this machine, from the built client
// (`npx vite build` first) served by the real server on a bench database holding the demo. Per page, a fresh profile:
// the JavaScript it fetched as sent (compressed bytes, every chunk it loaded), the first contentful paint, and for
// pages with a chart the time the chart's drawing surface appeared. Medians of RUNS loads, printed as a table.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { LocalPhotoStore } from '../server/storage/local-photo-store.ts';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './lib/chromium.ts';
import { chromium } from 'playwright-core';
import { createSequelize } from '../server/db/sequelize.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { initModels } from '../server/models/index.ts';
import { seedDemoOnce } from '../server/db/seed/demo.ts';
import { demoPictureAttacher } from '../server/db/seed/demo-pictures.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';
import { benchConfig, startBenchDb } from './lib/bench-db.ts';
import { startServerProcess } from './lib/bench-server.ts';
import { workbenchTools } from '../src/features/workbench/tools.ts';

const DATABASE = 'scanwright_pages';
const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const CHART = '[data-drawn-at]';
const MAKER = 'marit-builds';
const MODERATOR = 'demo-moderator';
/** Every workbench page, and those that draw a chart on first load (their example). */
const WORKBENCH = workbenchTools.map((t) => t.slug);
const CHARTED = new Set(['fit', 'creep', 'mixing', 'scan-planner']);
/** Targets from the page-weight issue: the home page and every other page, compressed JavaScript at first load. */
const HOME_KB = 100;
const PAGE_KB = 200;

if (!existsSync('dist/client/index.html')) {
  process.stderr.write('Build the client first: npx vite build\n');
  process.exit(1);
}

const stop = await startBenchDb();
const rows: Array<{ page: string; kb: number; fcp: number; chart: number | null }> = [];
try {
  const sq = createSequelize(benchConfig(DATABASE).db);
  await createMigrator(sq).up();
  initModels(sq);
  const uploads = mkdtempSync(join(tmpdir(), 'scanwright-bench-pages-'));
  try {
    await seedDemoOnce(sq, demoPictureAttacher(new LocalPhotoStore(uploads)));
  } finally {
    rmSync(uploads, { recursive: true, force: true });
  }
  const one = async (sql: string) => ((await sq.query(sql)) as [Array<{ id: number }>, unknown])[0][0]!.id;
  const build = await one("SELECT id FROM builds WHERE status = 'published' ORDER BY id LIMIT 1");
  const part = await one("SELECT id FROM parts WHERE status = 'accepted' ORDER BY accepted_run_count DESC, id LIMIT 1");
  const listing = await one('SELECT id FROM listings WHERE hidden_at IS NULL ORDER BY id LIMIT 1');
  const own = await one("SELECT b.id FROM builds b JOIN users u ON u.id = b.owner_id WHERE u.login = 'marit-builds' ORDER BY b.id LIMIT 1");
  await sq.close();
  // [path, has a chart, signed in as]: every page a visitor, a maker and a moderator open first.
  const pages: Array<[string, boolean, string?]> = [
    ['/', false],
    ['/builds', false],
    [`/builds/${build}`, true],
    ['/parts', false],
    [`/parts/${part}`, true],
    ['/exchange', false],
    [`/exchange/${listing}`, false],
    ['/workbench', false],
    ...WORKBENCH.map((slug): [string, boolean] => [`/workbench/${slug}`, CHARTED.has(slug)]),
    ['/api-reference', false],
    ['/', false, MAKER],
    ['/builds/new', false, MAKER],
    [`/builds/${own}/edit`, false, MAKER],
    ['/builds/mine', false, MAKER],
    ['/exchange/new', false, MAKER],
    ['/parts/propose', false, MAKER],
    ['/inbox', false, MAKER],
    ['/account', false, MAKER],
    ['/review', false, MODERATOR],
    ['/review/audit', false, MODERATOR],
  ];
  const server = await startServerProcess(DATABASE, { signIn: true });
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
  });
  try {
    for (const [path, hasChart, login] of pages) {
      const kbs: number[] = [];
      const fcps: number[] = [];
      const charts: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
        const page = await context.newPage();
        if (login) {
          await page.goto(`${server.base}/auth/github?login=${login}&returnTo=${encodeURIComponent(path)}`, { waitUntil: 'load' });
          await page.waitForURL(`${server.base}${path}`);
        } else await page.goto(`${server.base}${path}`, { waitUntil: 'load' });
        const drawn =
          hasChart &&
          (await page.waitForSelector(CHART, { timeout: 15_000 }).then(
            () => true,
            () => false,
          ));
        const chartAt = drawn ? await page.evaluate(() => performance.now()) : null;
        // Lazy chunks arrive after load; wait for the network to settle (bounded: a page that polls still gets measured).
        await page.waitForLoadState('networkidle', { timeout: 5_000 }).catch(() => undefined);
        const m = await page.evaluate(() => ({
          js: performance
            .getEntriesByType('resource')
            .filter((e) => (e as PerformanceResourceTiming).name.endsWith('.js'))
            .reduce((s, e) => s + (e as PerformanceResourceTiming).encodedBodySize, 0),
          fcp: performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN,
        }));
        kbs.push(m.js / 1024);
        fcps.push(m.fcp);
        if (chartAt !== null) charts.push(chartAt);
        await context.close();
      }
      const median = (xs: number[]) =>
        quantileSorted(
          [...xs].sort((a, b) => a - b),
          0.5,
        ) ?? NaN;
      rows.push({
        page: login ? `${path} (${login})` : path,
        kb: median(kbs),
        fcp: median(fcps),
        chart: charts.length ? median(charts) : null,
      });
    }
  } finally {
    await browser.close();
    await server.stop();
  }
} finally {
  await stop();
}

process.stdout.write(`\npage                                  JS KB (as sent)   FCP ms   chart ms   target\n`);
for (const r of rows) {
  const target = r.page === '/' || r.page.startsWith('/ (') ? HOME_KB : PAGE_KB;
  const verdict = r.kb <= target ? `OK ≤ ${target}` : `MISSED > ${target}`;
  process.stdout.write(
    `${r.page.padEnd(36)} ${r.kb.toFixed(1).padStart(15)} ${r.fcp.toFixed(0).padStart(8)} ${(r.chart === null ? '—' : r.chart.toFixed(0)).padStart(10)}   ${verdict}\n`,
  );
}
process.stdout.write(`medians of ${RUNS} loads each, a fresh browser profile per load; JS is every chunk the page fetched, compressed\n`);
