import { beforeAll, describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot, type LiveApp } from '../support/browser.ts';
import { signIn } from '../support/login.ts';
import { jpeg } from '../support/images.ts';
import { Build } from '../../server/models/build.model.ts';

const AFM = 'Beam-deflection AFM on a slate offcut';
const STM = 'Tube-scanner STM in a biscuit tin';
const PHOTO_ALTS = [
  'Optical lever bench: laser, mirror on the cantilever and the split photodiode',
  'The two bimorph bars glued to the tip holder',
];

/** Adds two photos to Marit's published build through the real upload route, so the gallery has something to open. */
async function addPhotos(live: LiveApp): Promise<number> {
  const agent = await signIn(live.t, 'marit-builds');
  const build = await Build.findOne({ where: { title: AFM } });
  let req = agent.post(`/api/builds/${build!.id}/photos`).set('X-CSRF-Token', agent.csrf);
  for (const alt of PHOTO_ALTS) req = req.field('alt', alt);
  for (const [i, size] of [
    [1200, 800],
    [800, 1000],
  ].entries())
    req = req.attach('photos', await jpeg(size[0]!, size[1]!), { filename: `p${i}.jpg`, contentType: 'image/jpeg' });
  const res = await req;
  expect(res.status).toBe(201);
  return build!.id;
}

const noSideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

describe('journey: reading builds', () => {
  const j = journey({ expectedConsole: /status of 404/ });
  let afmId: number;
  beforeAll(async () => {
    afmId = await addPhotos(j.live);
  });

  test('when a visitor filters the index by kind and opens a build, then the write-up, runs table, plot and photos show', async () => {
    const { page } = j.browser;
    // Other test files publish builds into the same database, so start from a kind filter the demo owns.
    await page.goto(`${j.live.baseUrl}/builds?kind=tunnelling-microscope`);
    await page.getByRole('heading', { level: 1, name: 'Builds' }).waitFor();
    await page.getByRole('link', { name: STM }).waitFor();
    expect(await page.getByRole('link', { name: 'Stylus profilometer from a record-player arm' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Sign in to write a build' }).getAttribute('href')).toBe(
      '/auth/github?returnTo=%2Fbuilds%3Fkind%3Dtunnelling-microscope',
    );
    expect(await page.getByRole('list', { name: 'Measured gains' }).first().textContent()).toMatch(/nm\/V/);
    await snapshot(page, 'builds-index-1280');

    await page.getByLabel('Instrument kind').selectOption('force-microscope');
    await page.waitForURL(/\/builds\?kind=force-microscope$/);
    await page.getByRole('link', { name: STM }).waitFor({ state: 'detached' });
    expect(await page.getByRole('status').textContent()).toContain('1 published build of kind “Force microscope”');

    await page.getByRole('link', { name: AFM }).click();
    await page.getByRole('heading', { level: 1, name: AFM }).waitFor();
    const writeUp = page.getByRole('region', { name: 'Write-up' });
    await writeUp.getByRole('heading', { name: 'Mechanics' }).waitFor();
    expect(await writeUp.getByRole('table').count()).toBe(1);

    const xBender = page.getByRole('article', { name: /^X bender/ });
    const runs = xBender.getByRole('table');
    expect(await runs.getByRole('columnheader', { name: 'Gain ± (nm/V)' }).count()).toBe(1);
    expect(await runs.getByRole('radio').count()).toBe(2);
    expect(await runs.getByRole('row').nth(1).textContent()).toMatch(/\d ± \d/);
    await xBender
      .getByRole('region', { name: /^Calibration plot: X bender/ })
      .locator('[data-drawn-at]')
      .waitFor();
    expect(Number(await xBender.locator('[data-drawn-at]').getAttribute('data-markers'))).toBeGreaterThan(10);
    expect(await xBender.getByText(/× expected \(series bimorph, PZT-5A · Source: Smits, Dalke & Cooney 1991\)/).count()).toBe(1);
    await xBender.getByText(/recorded in µm and V, plotted in nm and V/).waitFor();
    await runs.getByRole('radio').nth(1).check();
    await xBender.getByText(/recorded in nm and V; line fitted with an intercept/).waitFor();
    await page.getByText(/Hazardous voltage: some actuators of this build are driven above 42.4 V peak/).waitFor();
    await page
      .getByRole('article', { name: /^Z tube/ })
      .getByText(/Hazardous voltage: .* V peak is above the 42.4 V peak level/)
      .waitFor();

    // The demo seeds drawn pictures first; open the first of the photos this test uploaded.
    const thumbs = page.getByRole('list', { name: 'Photos of the build' }).getByRole('button', { name: PHOTO_ALTS[0]! });
    if ((await thumbs.count()) > 0) {
      await thumbs.first().click();
      const dialog = page.getByRole('dialog');
      await dialog.getByText(PHOTO_ALTS[0]!, { exact: true }).waitFor();
      await snapshot(page, 'build-lightbox-1280', { fullPage: false });
      await page.keyboard.press('ArrowRight');
      await dialog.getByText(PHOTO_ALTS[1]!, { exact: true }).waitFor();
      await page.keyboard.press('Tab');
      await page.keyboard.press('Tab');
      await page.keyboard.press('Tab');
      expect(await dialog.evaluate((d) => d.contains(document.activeElement))).toBe(true);
      await page.keyboard.press('Escape');
      await dialog.waitFor({ state: 'detached' });
      expect(await thumbs.first().evaluate((b) => b === document.activeElement)).toBe(true);
    }
    await snapshot(page, 'build-page-1280');
    expect(j.errors).toEqual([]);
  });

  test('when a visitor asks for a build under review or one that does not exist, then the page says there is no such published build', async () => {
    const { page } = j.browser;
    const submitted = await Build.findOne({ where: { title: 'Stylus profilometer from a record-player arm' } });
    for (const id of [submitted!.id, 99_999_999]) {
      await page.goto(`${j.live.baseUrl}/builds/${id}`);
      await page.getByRole('heading', { name: 'No such build (or it is not published)' }).waitFor();
    }
    await page.goto(`${j.live.baseUrl}/builds/mine`);
    await page.getByText('Sign in to see your builds').waitFor();
  });

  test('when the pages are read at phone width, then nothing scrolls sideways and the runs and plot still show', async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${j.live.baseUrl}/builds?kind=force-microscope`);
    await page.getByRole('link', { name: AFM }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'builds-index-390');
    await page.goto(`${j.live.baseUrl}/builds/${afmId}`);
    const xBender = page.getByRole('article', { name: /^X bender/ });
    await xBender
      .getByRole('region', { name: /^Calibration plot: X bender/ })
      .locator('[data-drawn-at]')
      .waitFor();
    expect(await xBender.getByRole('table').count()).toBe(0);
    expect(await xBender.getByRole('radio', { name: /^Plot the run of/ }).count()).toBe(2);
    expect(await xBender.getByText(/^Nonlinearity$/).count()).toBe(2);
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'build-page-390');
    await page.setViewportSize({ width: 1280, height: 860 });
  });

  test('when demo-maker signs in from the index, then the write button shows and my builds lists the draft', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/builds`);
    await page.getByRole('link', { name: 'Sign in to write a build' }).click();
    await page.getByRole('button', { name: /demo-maker/ }).click();
    await page.waitForURL(`${j.live.baseUrl}/builds`);
    await page.getByRole('link', { name: 'Write a build' }).waitFor();

    await page.goto(`${j.live.baseUrl}/builds/mine`);
    const draft = page
      .getByRole('listitem')
      .filter({ has: page.getByRole('link', { name: 'My first tunnelling microscope', exact: true }) });
    await draft.getByText('Draft', { exact: true }).waitFor();
    await snapshot(page, 'my-builds-1280');
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'my-builds-390');
    await page.setViewportSize({ width: 1280, height: 860 });

    await draft.getByRole('link', { name: 'My first tunnelling microscope', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'My first tunnelling microscope' }).waitFor();
    await page.getByRole('note').getByText('Only you and moderators can see this build.').waitFor();
    expect(await page.getByRole('link', { name: 'Edit build' }).getAttribute('href')).toMatch(/\/builds\/\d+\/edit$/);
    expect(j.errors).toEqual([]);
  });

  test('when stage-kwame opens my builds, then the returned build shows the review desk note', async () => {
    const { page } = j.browser;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().click();
    await page.getByRole('button', { name: /stage-kwame/ }).click();
    await page.waitForURL(/\/$|\/builds/);
    await page.goto(`${j.live.baseUrl}/builds/mine`);
    const returned = page
      .getByRole('listitem')
      .filter({ has: page.getByRole('link', { name: 'Micromanipulator for pulling glass tips', exact: true }) });
    await returned.getByText('Returned with notes').waitFor();
    await returned.getByText(/Please add at least one photo/).waitFor();
    await page.getByText('edited since review').waitFor();
    await snapshot(page, 'my-builds-returned-1280');
  });
});
