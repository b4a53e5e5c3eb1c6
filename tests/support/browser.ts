import { afterAll, beforeAll } from 'vitest';
import { mkdtempSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Server } from 'node:http';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { startTestApp, type TestApp } from './test-app.ts';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../scripts/lib/chromium.ts';
import { freePort } from '../../scripts/lib/scratch.mjs';
import { seedDemoOnce } from '../../server/db/seed/demo.ts';
import { demoPictureAttacher } from '../../server/db/seed/demo-pictures.ts';

export interface LiveApp {
  t: TestApp;
  baseUrl: string;
  close(): Promise<void>;
}

/** The real built app (dist/client) listening on a free loopback port, demo accounts seeded. */
async function startLiveApp(): Promise<LiveApp> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const uploadsDir = process.env.TEST_UPLOADS_DIR ?? mkdtempSync(join(tmpdir(), 'scanwright-live-uploads-'));
  mkdirSync(uploadsDir, { recursive: true });
  const t = await startTestApp({ publicUrl: baseUrl, port, uploadsDir });
  await seedDemoOnce(t.handle.sequelize, demoPictureAttacher(t.handle.photos));
  const server: Server = await new Promise((resolve) => {
    const s = t.app.listen(port, '127.0.0.1', () => resolve(s));
  });
  return {
    t,
    baseUrl,
    async close() {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await t.close();
    },
  };
}

export const SCREENSHOTS = 'test-output/screenshots';

/**
 * A screenshot for people to look at (`test-output/screenshots/<name>.png`; a page is captured whole unless
 * `fullPage: false`), taken only when TEST_SCREENSHOTS=1: whole-page captures cost about a fifth of chromium's CPU in
 * these tests, and no test reads them. A failing test's pages are photographed either way (browser-failures.ts).
 */
export async function snapshot(target: Page | Locator, name: string, options: { fullPage?: boolean } = {}): Promise<void> {
  if (process.env.TEST_SCREENSHOTS !== '1') return;
  mkdirSync(SCREENSHOTS, { recursive: true });
  const path = `${SCREENSHOTS}/${name}.png`;
  if ('goto' in target) await target.screenshot({ path, fullPage: options.fullPage ?? true });
  else await target.screenshot({ path });
}

/** The browser contexts open right now (tests/support/browser-failures.ts photographs them when a test fails). */
export const openContexts = new Set<BrowserContext>();

/**
 * One chromium per test worker (files in a worker share the module cache), started on first use; it goes with the
 * worker. Launching a browser costs about twice as much as a fresh context in a running one.
 */
let running: Promise<Browser> | null = null;
function sharedChromium(): Promise<Browser> {
  running ??= chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS });
  return running.then((b) => {
    if (b.isConnected()) return b;
    running = null;
    return sharedChromium();
  });
}

/** Debian's chromium through playwright-core, with a fresh context (no cookies, storage or cache) per journey. */
async function launchBrowser(
  options: { bypassCSP?: boolean } = {},
): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const context = await (
    await sharedChromium()
  ).newContext({
    viewport: { width: 1280, height: 860 },
    // Only for tests that inject a checker script (axe-core) into our pages; the policy itself is tested elsewhere.
    bypassCSP: options.bypassCSP ?? false,
  });
  const page = await context.newPage();
  openContexts.add(context);
  return {
    context,
    page,
    async close() {
      openContexts.delete(context);
      await context.close();
    },
  };
}

/** On the new-listing page: search the part picker and choose the part shown as "<name> (<category label>)". */
export async function pickListingPart(page: Page, search: string, name: string, categoryLabel: string): Promise<void> {
  await page.getByRole('heading', { level: 1, name: 'New listing' }).waitFor();
  await page.getByLabel('Find a part').fill(search);
  await page.getByLabel('Part', { exact: true }).locator('option', { hasText: name }).waitFor({ state: 'attached' });
  await page.getByLabel('Part', { exact: true }).selectOption({ label: `${name} (${categoryLabel})` });
}

/** What a journey's tests share: the live app, the browser, and every console error and page error seen. */
export interface Journey {
  live: LiveApp;
  browser: Awaited<ReturnType<typeof launchBrowser>>;
  errors: string[];
}

/**
 * Starts the live app and a browser before a describe block's tests and closes both after, collecting
 * console and page errors (tests end with `expect(j.errors).toEqual([])`). Call it inside `describe`; a `beforeAll`
 * after it runs once the app is up. `expectedConsole` matches console errors the journey provokes on purpose (the
 * browser logs every 4xx answer, e.g. a page for a hidden build), which are not collected.
 */
export function journey(options: { bypassCSP?: boolean; expectedConsole?: RegExp } = {}): Journey {
  const j = { errors: [] as string[] } as Journey;
  beforeAll(async () => {
    j.live = await startLiveApp();
    j.browser = await launchBrowser({ bypassCSP: options.bypassCSP });
    j.browser.page.on('pageerror', (e) => j.errors.push(e.message));
    j.browser.page.on('console', (m) => {
      // A failed load names only its status; the resource's address says which read it was.
      const where = m.location().url;
      const text = /^Failed to load resource/.test(m.text()) && where ? `${m.text()} (${where})` : m.text();
      if (m.type() === 'error' && !options.expectedConsole?.test(text)) j.errors.push(text);
    });
  });
  afterAll(async () => {
    await j.browser?.close();
    await j.live?.close();
  });
  return j;
}
