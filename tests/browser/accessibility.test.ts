import { describe, expect, test } from 'vitest';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import type { AxeResults, RunOptions } from 'axe-core';
import { journey, snapshot } from '../support/browser.ts';
import { Build } from '../../server/models/build.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Photo } from '../../server/models/photo.model.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';

const AXE = createRequire(import.meta.url).resolve('axe-core/axe.min.js');
const AFM = 'Beam-deflection AFM on a slate offcut';
const BAR = DEMO_PARTS.find((p) => p.key === 'cartridge-bar')!.name;

/** Loads a page, waits until its heading shows and the network is quiet, then runs every axe-core rule on it. */
async function violations(page: Page, url: string, load = true): Promise<string[]> {
  if (load) await page.goto(url);
  await page.locator('main h1').first().waitFor();
  await page.waitForLoadState('networkidle');
  await page.getByText(/^Loading/).waitFor({ state: 'detached' });
  await page.addScriptTag({ path: AXE });
  const found = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, options: RunOptions): Promise<AxeResults> } }).axe;
    return (await axe.run(document, { rules: { 'label-content-name-mismatch': { enabled: true } } })).violations;
  });
  return found.map(
    (v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => `${n.target.join(' ')}: ${n.failureSummary ?? ''}`).join(' | ')}`,
  );
}

/** Every page's violations, keyed by its path; the expected value is an empty object. */
async function audit(page: Page, base: string, pathsToCheck: string[]): Promise<Record<string, string[]>> {
  const report: Record<string, string[]> = {};
  for (const path of pathsToCheck) {
    const found = await violations(page, `${base}${path}`);
    if (found.length > 0) report[path] = found;
  }
  return report;
}

describe('journey: axe-core finds no accessibility violations on the main pages', () => {
  const j = journey({ bypassCSP: true });

  test('when a visitor reads the builds, registry, exchange and workbench, then no page has a violation', async () => {
    const { page } = j.browser;
    const build = await Build.findOne({ where: { title: AFM } });
    const part = await Part.findOne({ where: { name: BAR } });
    const listing = await Listing.findOne({ where: { status: 'open' } });
    const report = await audit(page, j.live.baseUrl, [
      '/',
      '/builds',
      `/builds/${build!.id}`,
      '/parts',
      `/parts/${part!.id}`,
      '/exchange',
      `/exchange/${listing!.id}`,
      '/workbench',
      '/workbench/fit',
      '/workbench/mixing',
      '/workbench/expected-gain',
    ]);
    expect(report).toEqual({});
    expect(j.errors).toEqual([]);
  });

  test('when a visitor reads the same pages on a 390 px phone, then no page has a violation', async () => {
    const { page } = j.browser;
    const build = await Build.findOne({ where: { title: AFM } });
    const part = await Part.findOne({ where: { name: BAR } });
    await page.setViewportSize({ width: 390, height: 844 });
    const report = await audit(page, j.live.baseUrl, [
      '/',
      '/builds',
      `/builds/${build!.id}`,
      '/parts',
      `/parts/${part!.id}`,
      '/exchange',
      '/workbench/fit',
    ]);
    await page.getByRole('button', { name: 'Menu' }).click();
    const menu = await violations(page, page.url(), false);
    await page.setViewportSize({ width: 1280, height: 860 });
    expect({ ...report, ...(menu.length > 0 ? { 'menu open': menu } : {}) }).toEqual({});
    expect(j.errors).toEqual([]);
  });

  test('when a maker opens the editor of a build with photos, the account and the inbox, then no page has a violation', async () => {
    const { page } = j.browser;
    const build = await Build.findOne({ where: { title: AFM } });
    expect(await Photo.count({ where: { buildId: build!.id } })).toBeGreaterThan(0);
    const edit = `/builds/${build!.id}/edit`;
    await page.goto(`${j.live.baseUrl}/auth/github?login=marit-builds&returnTo=${encodeURIComponent(edit)}`);
    await page.waitForURL(`${j.live.baseUrl}${edit}`);
    await page
      .getByRole('button', { name: /Make cover/ })
      .first()
      .waitFor();
    const report = await audit(page, j.live.baseUrl, [edit, '/account', '/inbox', '/builds/mine']);
    await snapshot(page, 'accessibility-inbox');
    expect(report).toEqual({});
    expect(j.errors).toEqual([]);
  });

  test('when a moderator opens the review desk and the audit, then neither has a violation', async () => {
    const { page } = j.browser;
    await page.context().clearCookies();
    await page.goto(`${j.live.baseUrl}/auth/github?login=demo-moderator&returnTo=%2Freview`);
    await page.waitForURL(`${j.live.baseUrl}/review`);
    const report = await audit(page, j.live.baseUrl, ['/review', '/review/audit']);
    expect(report).toEqual({});
    expect(j.errors).toEqual([]);
  });
});
