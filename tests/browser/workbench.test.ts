import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { fitCalibrationInUnits } from '../../shared/workbench/calibration-fit.ts';
import type { DisplacementUnit } from '../../shared/units.ts';
import { formatWithUncertainty } from '../../shared/format/measured-number.ts';
import { journey, snapshot } from '../support/browser.ts';
import { workbenchTools } from '../../src/features/workbench/tools.ts';

// A bender run with up and down sweeps; one bad line (7) that must be left out and reported.
const csv = [
  'volts,displacement,sweep',
  '0,2,up',
  '2,171,up',
  '4,366,up',
  '6,577,up',
  '8,790,up',
  '10,1003,up',
  '8,abc,down',
  '10,1003,down',
  '8,840,down',
  '6,634,down',
  '4,420,down',
  '2,215,down',
  '0,11,down',
].join('\n');

/** The gain text the page must show, computed with the same shared fit and formatter [calc]. */
function expectedGain(unit: DisplacementUnit): string {
  const points = csv
    .split('\n')
    .slice(1)
    .map((l) => l.split(','))
    .filter(([, x]) => x !== 'abc')
    .map(([v, x, s]) => ({ volts: Number(v), displacement: Number(x), sweep: s as 'up' | 'down' }));
  const fit = fitCalibrationInUnits({ points, displacementUnit: unit });
  const f = formatWithUncertainty(fit.gainNmPerV, (fit.gainCi95NmPerV[1] - fit.gainCi95NmPerV[0]) / 2);
  return `${f.value} ± ${f.uncertainty} nm/V`;
}

const slugs = workbenchTools.map((t) => t.slug);

async function noHorizontalScroll(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
}

describe('journey: a visitor uses the workbench', () => {
  const j = journey();

  test('when a CSV with up and down sweeps is pasted on the fit page, then the gain and the plot show, and a unit change changes the gain', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench`);
    await page.getByRole('heading', { level: 1, name: 'Workbench' }).waitFor();
    await snapshot(page, 'workbench-index-desktop');

    await page.getByRole('link', { name: /Gain fit/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Gain fit' }).waitFor();
    await page.getByRole('radio', { name: 'Paste or load a CSV' }).check();
    await page.getByLabel('CSV text').fill(csv);

    const gain = page.getByRole('status', { name: 'Gain' });
    await gain.filter({ hasText: expectedGain('nm') }).waitFor();
    await page.getByText('12 points used, 1 left out').waitFor();
    await page.getByText('displacement “abc” is not a number').waitFor();
    await page.getByRole('figure', { name: 'Calibration plot' }).locator('[data-drawn-at]').first().waitFor();
    expect(await page.getByRole('figure', { name: 'Calibration plot' }).getByText('Down sweep').count()).toBeGreaterThan(0);
    await snapshot(page, 'workbench-fit-desktop');

    await page.getByLabel('Displacement unit').selectOption('um');
    await gain.filter({ hasText: expectedGain('um') }).waitFor();
    expect(expectedGain('um')).not.toBe(expectedGain('nm'));
    expect(j.errors).toEqual([]);
  });

  test('when the scan planner amplifier output crosses 42.4 V peak (IEC 61010-1), then the caution shows, and not below', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench/scan-planner`);
    const amp = page.getByLabel('Amplifier gain (V/V)');
    await amp.fill('1');
    // 102.6 nm/V × 10 V / 2^16 = 0.01566 nm [calc]
    await page.getByRole('status', { name: 'Smallest step at 16 bit' }).filter({ hasText: '0.01566 nm' }).waitFor();
    expect(await page.getByRole('alert').filter({ hasText: 'Hazardous voltage' }).count()).toBe(0);

    await amp.fill('20');
    const caution = page.getByRole('alert').filter({ hasText: 'Hazardous voltage' });
    await caution.waitFor();
    expect(await caution.textContent()).toContain('local electrical codes or qualified practice');
    await page.getByRole('figure', { name: 'Step against DAC bits' }).locator('[data-drawn-at]').first().waitFor();
    await snapshot(page, 'workbench-scan-planner-desktop');
    expect(j.errors).toEqual([]);
  });

  test('when every calculator opens at desktop and at 390 px, then each shows a result and the phone page does not scroll sideways', async () => {
    const { page } = j.browser;
    for (const width of [1280, 390]) {
      await page.setViewportSize({ width, height: 860 });
      const tag = width === 390 ? 'phone' : 'desktop';
      for (const slug of slugs) {
        await page.goto(`${j.live.baseUrl}/workbench/${slug}`);
        await page.getByRole('heading', { level: 1 }).waitFor();
        await page
          .getByRole('region', { name: /Results|Displacement/ })
          .first()
          .waitFor();
        const chart = page.getByRole('figure');
        if (await chart.count()) await chart.first().locator('[data-drawn-at]').first().waitFor();
        if (width === 390 || !['fit', 'scan-planner'].includes(slug)) {
          await snapshot(page, `workbench-${slug}-${tag}`);
        }
        expect(await noHorizontalScroll(page), `${slug} at ${width} px`).toBe(true);
      }
    }
    await page.goto(`${j.live.baseUrl}/workbench`);
    await page.getByRole('heading', { level: 1, name: 'Workbench' }).waitFor();
    await snapshot(page, 'workbench-index-phone');
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  }, 240_000);
});
