import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot } from '../support/browser.ts';
import { dragAcross, xRange } from '../../scripts/lib/chart-gestures.ts';
import { syntheticLoopCsv } from '../../shared/stats/synthetic-loop.ts';

const PLOT = '[data-testid="chart"] [data-drawn-at]';

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
    const whole = await xRange(plot);
    expect(whole[0]).toBeLessThanOrEqual(-60);
    expect(whole[1]).toBeGreaterThanOrEqual(60);
    const reset = page.getByRole('button', { name: 'Reset zoom' });
    expect(await reset.isDisabled()).toBe(true);

    // Drag across the middle third: x narrows to about that stretch.
    await dragAcross(page, box, 0.35, 0.65);
    await expect.poll(async () => (await xRange(plot))[1] - (await xRange(plot))[0]).toBeLessThan((whole[1] - whole[0]) * 0.6);
    const zoomed = await xRange(plot);
    expect(zoomed[0]).toBeGreaterThan(whole[0]);
    expect(await reset.isDisabled()).toBe(false);

    // Shift-drag to the left: the same width, moved to higher volts.
    await dragAcross(page, box, 0.6, 0.4, { shift: true });
    await expect.poll(async () => (await xRange(plot))[0]).toBeGreaterThan(zoomed[0]);
    const panned = await xRange(plot);
    expect(panned[1] - panned[0]).toBeCloseTo(zoomed[1] - zoomed[0], 6);
    await snapshot(page, 'chart-zoom-panned', { fullPage: false });

    // "Reset zoom" brings the whole range back; so does a double-click after another zoom.
    await reset.click();
    await expect.poll(() => xRange(plot)).toEqual(whole);
    await dragAcross(page, box, 0.3, 0.5);
    await expect.poll(async () => (await xRange(plot))[0]).toBeGreaterThan(whole[0]);
    await plot.dblclick({ position: { x: box.width / 2, y: box.height * 0.4 } });
    await expect.poll(() => xRange(plot)).toEqual(whole);

    // "Show as text" puts the record back in the box.
    await page.getByRole('button', { name: 'Show as text' }).click();
    expect((await page.getByLabel('CSV text').inputValue()).length).toBeGreaterThan(200_000);
    expect(j.errors).toEqual([]);
  });
});
