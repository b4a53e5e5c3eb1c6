import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createUser } from '../support/factories.ts';

/** Width and height of every card in the builds grid, rounded to whole pixels. */
const cardSizes = (page: Page) =>
  page
    .getByRole('list', { name: 'Builds' })
    .locator(':scope > li > article')
    .evaluateAll((cards) =>
      cards.map((c) => `${Math.round(c.getBoundingClientRect().width)}×${Math.round(c.getBoundingClientRect().height)}`),
    );

describe('journey: loading pages and the builds grid', () => {
  const j = journey();

  test('when a page waits for its data, then a thin progress bar shows until it arrives', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench`);
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/api\/parts\?/, async (route) => {
      await held;
      await route.continue();
    });
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Parts registry' }).click();
    // The page's code has arrived (its heading shows); its data is what is held.
    await page.getByRole('heading', { level: 1, name: 'Parts registry' }).waitFor();
    const bar = page.getByRole('progressbar', { name: 'Loading the page' });
    await bar.waitFor();
    // It fades in after its short delay (index.css) and spans the top of the window.
    await expect.poll(() => bar.locator('div').evaluate((el) => getComputedStyle(el).opacity)).toBe('1');
    const box = await bar.evaluate((el) => JSON.parse(JSON.stringify(el.getBoundingClientRect())) as DOMRect);
    expect(box).toMatchObject({ y: 0, x: 0, width: await page.evaluate(() => window.innerWidth) });
    expect(box.height).toBeGreaterThan(0);
    expect(box.height).toBeLessThanOrEqual(4);
    await snapshot(page, 'route-progress-1366', { fullPage: false });
    release();
    await page.getByRole('table').waitFor();
    await bar.waitFor({ state: 'detached' });
    await page.unroute(/\/api\/parts\?/);
    expect(j.errors).toEqual([]);
  });

  test('when builds with and without a photo share the grid, then every card has the same size at 1366 and 390 px', async () => {
    const owner = await createUser();
    for (const title of ['A build without any photo', 'Another one without a photo, and with a title long enough to wrap twice'])
      await createBuildRow(owner.id, { status: 'published', title });
    const { page } = j.browser;
    for (const width of [1366, 390]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${j.live.baseUrl}/builds`);
      await page.getByRole('link', { name: 'A build without any photo' }).waitFor();
      const grid = page.getByRole('list', { name: 'Builds' });
      expect(await grid.locator('img').count()).toBeGreaterThan(0);
      const sizes = await cardSizes(page);
      expect(sizes.length).toBeGreaterThanOrEqual(4);
      expect(new Set(sizes)).toEqual(new Set([sizes[0]]));
      await snapshot(page, `builds-grid-${width}`);
    }
    expect(j.errors).toEqual([]);
  });

  test("when a page's code is still on its way, then the bar shows; when it cannot load, the page says so and leaving clears it", async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`${j.live.baseUrl}/workbench`);
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/assets\/api-reference-[^/]*\.js/, async (route) => {
      await held;
      await route.continue();
    });
    await page.getByRole('link', { name: 'API and rig tokens' }).click();
    const bar = page.getByRole('progressbar', { name: 'Loading the page' });
    await bar.waitFor();
    release();
    await page.getByRole('heading', { level: 1, name: /API/ }).waitFor();
    await bar.waitFor({ state: 'detached' });
    await page.unroute(/\/assets\/api-reference-[^/]*\.js/);
    expect(j.errors).toEqual([]);

    // A chunk that fails (a deploy replaced it, the network dropped) shows the error block, not a blank page.
    await page.route(/\/assets\/notifications-[^/]*\.js/, (route) => route.abort());
    await page.goto(`${j.live.baseUrl}/notifications`);
    await page.getByRole('heading', { name: 'Something went wrong' }).waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Workbench' }).click();
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    expect(await page.getByRole('heading', { name: 'Something went wrong' }).count()).toBe(0);
    await page.unroute(/\/assets\/notifications-[^/]*\.js/);
    // The only errors are the browser's own reports of the refused chunk.
    expect(j.errors.length).toBeGreaterThan(0);
    expect(j.errors.filter((e) => !/notifications-|Failed to fetch|ERR_FAILED|dynamically imported module/i.test(e))).toEqual([]);
  });
});
