import { describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';
import { Build } from '../../server/models/build.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';

const AFM = 'Beam-deflection AFM on a slate offcut';
const BAR = DEMO_PARTS.find((p) => p.key === 'cartridge-bar')!.name;

describe('journey: every chart has its figures in words', () => {
  const j = journey();

  test('when the pages with charts are open, then each chart has a "Figures in this chart" text and legends at the text size', async () => {
    const { page } = j.browser;
    const build = await Build.findOne({ where: { title: AFM } });
    const part = await Part.findOne({ where: { name: BAR } });
    const pages = [
      `/builds/${build!.id}`,
      `/parts/${part!.id}`,
      '/workbench/scan-planner',
      '/workbench/mixing',
      '/workbench/creep',
      '/workbench/sine-fit',
    ];
    let charts = 0;
    for (const path of pages) {
      await page.goto(`${j.live.baseUrl}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.waitForLoadState('networkidle');
      const wrappers = page.getByTestId('chart');
      await wrappers.first().waitFor();
      const n = await wrappers.count();
      charts += n;
      // One text alternative per chart, right after it, naming figures with their units.
      const figures = page.locator('details', { has: page.locator('summary', { hasText: 'Figures in this chart' }) });
      expect(await figures.count(), path).toBe(n);
      const first = figures.first();
      await first.locator('summary').click();
      expect(await first.locator('dl').textContent(), path).toMatch(/\d.*(nm|V|s)\b/);
      // Every chart has a legend, at the page's small text size (14 px), never smaller.
      const sizes = await page.locator('ul[aria-label="Legend"]').evaluateAll((els) => els.map((el) => getComputedStyle(el).fontSize));
      expect(sizes.length, path).toBe(n);
      for (const size of sizes) expect(size, path).toBe('14px');
    }
    expect(charts).toBeGreaterThanOrEqual(pages.length);
    await snapshot(page, 'chart-figures-sine-fit-1366');
    expect(j.errors).toEqual([]);
  });
});
