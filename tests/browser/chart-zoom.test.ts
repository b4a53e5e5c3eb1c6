import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, SCREENSHOTS } from '../support/browser.ts';
import { syntheticLoopCsv } from '../../shared/stats/synthetic-loop.ts';

const PLOT = '[data-testid="chart"] [data-drawn-at]';

/** The x range the chart shows (the wrapper keeps it in `data-x-range`). */
async function xRange(page: Page): Promise<[number, number]> {
  const raw = (await page.locator(PLOT).first().getAttribute('data-x-range')) ?? 'NaN,NaN';
  const [a, b] = raw.split(',').map(Number);
  return [a!, b!];
}

/** Pastes text into the focused CSV box the way a browser does (a paste event carrying the clipboard's text). */
async function paste(page: Page, text: string) {
  await page.getByLabel('CSV text').evaluate((area, csv) => {
    const data = new DataTransfer();
    data.setData('text/plain', csv);
    area.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

describe('journey: a visitor zooms into a long calibration record on the fit page', () => {
  const j = journey();

  test('when 100 000 points are pasted, then they are held out of the text box, plotted without markers, and the chart zooms, pans and resets', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench/fit`);
    // The example's chart first (the chart code is loaded), then the CSV source.
    await page.locator(PLOT).first().waitFor();
    await page.getByRole('radio', { name: 'Paste or load a CSV' }).check();
    await paste(page, syntheticLoopCsv(100_000, 70));

    // The text stays out of the box: a line says how much is in use.
    await expect.poll(() => page.getByRole('status').filter({ hasText: '100,001 lines' }).count(), { timeout: 20_000 }).toBe(1);
    expect(await page.getByLabel('CSV text').count()).toBe(0);
    // Every point is used and drawn as a cloud of pixels (one square per device pixel), not 100 000 markers.
    await page.getByText('100000 points used.').waitFor({ timeout: 20_000 });
    const plot = page.locator(PLOT).first();
    await expect.poll(async () => Number(await plot.getAttribute('data-markers')), { timeout: 20_000 }).toBeGreaterThan(200);
    expect(Number(await plot.getAttribute('data-markers'))).toBeLessThan(20_000);
    await plot.scrollIntoViewIfNeeded();
    const box = (await plot.boundingBox())!;
    const whole = await xRange(page);
    expect(whole[0]).toBeLessThanOrEqual(-60);
    expect(whole[1]).toBeGreaterThanOrEqual(60);
    const reset = page.getByRole('button', { name: 'Reset zoom' });
    expect(await reset.isDisabled()).toBe(true);

    // Drag across the middle third: x narrows to about that stretch.
    const y = box.y + box.height * 0.4;
    await page.mouse.move(box.x + box.width * 0.35, y);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.5, y, { steps: 5 });
    await page.mouse.move(box.x + box.width * 0.65, y, { steps: 5 });
    await page.mouse.up();
    await expect.poll(async () => (await xRange(page))[1] - (await xRange(page))[0]).toBeLessThan((whole[1] - whole[0]) * 0.6);
    const zoomed = await xRange(page);
    expect(zoomed[0]).toBeGreaterThan(whole[0]);
    expect(await reset.isDisabled()).toBe(false);

    // Shift-drag to the left: the same width, moved to higher volts.
    await page.keyboard.down('Shift');
    await page.mouse.move(box.x + box.width * 0.6, y);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.4, y, { steps: 8 });
    await page.mouse.up();
    await page.keyboard.up('Shift');
    await expect.poll(async () => (await xRange(page))[0]).toBeGreaterThan(zoomed[0]);
    const panned = await xRange(page);
    expect(panned[1] - panned[0]).toBeCloseTo(zoomed[1] - zoomed[0], 6);
    await page.screenshot({ path: `${SCREENSHOTS}/chart-zoom-panned.png`, fullPage: false });

    // "Reset zoom" brings the whole range back; so does a double-click after another zoom.
    await reset.click();
    await expect.poll(() => xRange(page)).toEqual(whole);
    await page.mouse.move(box.x + box.width * 0.3, y);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.5, y, { steps: 8 });
    await page.mouse.up();
    await expect.poll(async () => (await xRange(page))[0]).toBeGreaterThan(whole[0]);
    await plot.dblclick({ position: { x: box.width / 2, y: box.height * 0.4 } });
    await expect.poll(() => xRange(page)).toEqual(whole);

    // "Show as text" puts the record back in the box.
    await page.getByRole('button', { name: 'Show as text' }).click();
    expect((await page.getByLabel('CSV text').inputValue()).length).toBeGreaterThan(200_000);
    expect(j.errors).toEqual([]);
  });
});
