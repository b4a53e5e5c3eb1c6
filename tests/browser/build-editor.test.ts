import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { journey, snapshot } from '../support/browser.ts';
import { Build } from '../../server/models/build.model.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';

const TITLE = 'Bimorph-bar STM on a granite offcut';
const PART = DEMO_PARTS.find((p) => p.key === 'cartridge-bar')!.name;
const PHOTO_ALT = 'The scanner head: two cartridge bars glued in a V under the tip holder';
const BENCH_ALT = 'The granite offcut on four squash balls, the head clamped on top';

/** An up and a down sweep at about 96 nm/V with a small loop, one unreadable row, and a header. */
const CSV = [
  'volts,displacement,sweep',
  ...[0, 5, 10, 15, 20, 25, 30].map((v) => `${v},${(96 * v - 0.12 * v * (30 - v)).toFixed(1)},up`),
  '35,abc,up',
  ...[30, 25, 20, 15, 10, 5, 0].map((v) => `${v},${(96 * v + 0.12 * v * (30 - v)).toFixed(1)},down`),
].join('\n');

const noSideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

describe('journey: a maker writes a build and submits it for review', () => {
  // The non-photo upload answers 415 on purpose; the browser logs that as a console error.
  const j = journey({ expectedConsole: /status of 415/ });
  /** The files the maker uploads. */
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'scanwright-editor-'));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  test('when demo-maker creates a build, uploads a photo, adds an actuator and a run from CSV and submits, then the build is submitted for review', async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 1280, height: 860 });

    await page.goto(`${j.live.baseUrl}/builds/new`);
    await page.getByText('Sign in to write builds').waitFor();
    await page.getByRole('main').getByRole('link', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: /demo-maker/ }).click();
    await page.waitForURL(`${j.live.baseUrl}/builds/new`);

    await page.getByLabel('Title', { exact: true }).fill(TITLE);
    await page.getByLabel('Instrument kind').selectOption('tunnelling-microscope');
    await page.getByLabel('Stage').selectOption('assembling');
    await page.getByLabel('Summary').fill('A first STM from two record-player cartridge bars.');
    await page.getByLabel('Write-up', { exact: true }).fill('Two **cartridge bars** in a V.');
    // The toolbar makes the line a heading; the rendering beside the text follows as it is typed.
    await page.getByLabel('Write-up', { exact: true }).press('Control+Home');
    await page.getByRole('toolbar', { name: 'Write-up: insert' }).getByRole('button', { name: 'Heading' }).click();
    await expect.poll(() => page.getByLabel('Write-up', { exact: true }).inputValue()).toBe('## Two **cartridge bars** in a V.');
    await page
      .getByRole('region', { name: 'Write-up as readers see it' })
      .getByRole('heading', { name: 'Two cartridge bars in a V.' })
      .waitFor();
    await snapshot(page, 'build-new-1280');
    await page.getByRole('button', { name: 'Create draft' }).click();
    await page.waitForURL(/\/builds\/\d+\/edit$/);
    await page.getByRole('heading', { level: 1, name: TITLE }).waitFor();

    // A dated log entry, written in Markdown and checked in the preview.
    await page.getByRole('button', { name: 'Add a log entry' }).click();
    await page.getByLabel('Date').fill('2026-11-20');
    await page.getByLabel('Entry title').fill('Glued the bars');
    await page.getByLabel('Entry text', { exact: true }).fill('Epoxy, **24 h** cure.');
    await page.getByRole('button', { name: 'Add entry' }).click();
    await page.getByRole('heading', { name: /2026-11-20\s*Glued the bars/ }).waitFor();

    // Photos: a JPEG, a PNG and a file that only pretends to be a photo, each its own request with its own bar.
    const photo = join(dir, 'scanner-head.jpg');
    await writeFile(
      photo,
      await sharp({ create: { width: 1200, height: 900, channels: 3, background: { r: 181, g: 83, b: 42 } } })
        .jpeg()
        .toBuffer(),
    );
    const bench = join(dir, 'bench.png');
    await writeFile(
      bench,
      await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 47, g: 111, b: 115 } } })
        .png()
        .toBuffer(),
    );
    const fake = join(dir, 'notes.jpg');
    await writeFile(fake, 'not an image at all, just text');
    await page.getByLabel('Choose photos').setInputFiles([photo, bench, fake]);
    await page.getByRole('button', { name: 'Upload 3 photos' }).click();
    await page.getByText('Describe the photo before uploading it.').first().waitFor();
    await page.getByLabel('Alt text for scanner-head.jpg (required)').fill(PHOTO_ALT);
    await page.getByLabel('Alt text for bench.png (required)').fill(BENCH_ALT);
    await page.getByLabel('Alt text for notes.jpg (required)').fill('Not really a photo');
    await page.getByRole('button', { name: 'Upload 3 photos' }).click();
    for (const name of ['scanner-head.jpg', 'bench.png']) {
      await page
        .getByRole('progressbar', { name: `Upload of ${name}` })
        .and(page.locator('[aria-valuenow="100"][aria-valuetext="Uploaded"]'))
        .waitFor();
    }
    await page.getByText('That file is not a photo we can read.').waitFor();
    const gallery = page.getByRole('list', { name: 'Photos of this build' });
    await gallery.getByRole('img', { name: PHOTO_ALT }).waitFor();
    await gallery.getByRole('img', { name: BENCH_ALT }).waitFor();
    const second = await gallery.getByRole('img').nth(1).getAttribute('alt');
    await page.getByRole('button', { name: 'Make cover: photo 2' }).click();
    await page.getByRole('button', { name: 'Make cover: photo 1' }).waitFor();
    await page.getByRole('button', { name: 'Move photo 2 earlier' }).click();
    await gallery.getByRole('img').first().and(page.getByAltText(second!)).waitFor();
    expect(await page.evaluate(() => document.activeElement?.textContent)).toMatch(/Later/);
    await page.keyboard.press('Enter');
    await gallery.getByRole('img').nth(1).and(page.getByAltText(second!)).waitFor();
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('Move photo 2 earlier');
    await snapshot(page.locator('#photos'), 'build-editor-photos-1280');

    // An actuator from the parts registry; 60 V trips the IEC 61010-1 caution (above 42.4 V peak).
    await page.getByRole('button', { name: 'Add an actuator' }).click();
    await page.getByLabel('Search the parts registry').fill('cartridge');
    await page.getByRole('radio', { name: PART }).check();
    await page.getByLabel('Label (optional)').fill('Z bender pair');
    await page.getByLabel('Axis').selectOption('Z');
    await page.getByLabel('Drive', { exact: true }).selectOption('pair-anti-phase');
    await page.getByLabel('Max volts (optional)').fill('60');
    await page.getByText('Hazardous voltage: 60 V peak is above the 42.4 V peak level').waitFor();
    await page.getByText(/do not replace local electrical codes or qualified practice/).waitFor();
    await page.getByRole('button', { name: 'Add actuator' }).click();
    await page.getByRole('heading', { name: 'Z bender pair' }).waitFor();

    // A calibration run pasted as CSV with up and down sweeps; the bad row is listed and left out.
    await page.getByRole('button', { name: 'Add a calibration run to Z bender pair' }).click();
    const run = page.getByRole('form', { name: 'New calibration run' });
    await run.getByLabel('Method').selectOption('optical-lever');
    await run.getByLabel('Displacement unit').selectOption('nm');
    await run.getByText('Paste or upload CSV').click();
    await run.getByLabel('CSV text').fill(CSV);
    await run.getByRole('button', { name: 'Use pasted points' }).click();
    await run.getByText('14 points from pasted CSV are now in the grid.').waitFor();
    await run.getByText('Row 9: displacement “abc” is not a number').waitFor();
    const preview = run.getByRole('region', { name: 'Live fit preview' });
    await preview.getByText('Gain (preview)').waitFor();
    expect(await preview.textContent()).toMatch(/9[56]\.\d+ ± \d+\.\d+\s*nm\/V/);
    expect(await preview.textContent()).toMatch(/Hysteresis\d+(\.\d+)? % of span/);
    await preview.locator('[data-drawn-at]').first().waitFor();
    await snapshot(run, 'build-editor-run-form-1280');
    await run.getByRole('button', { name: 'Save calibration run' }).click();
    await page.getByText('Stored fit, computed by Scanwright').waitFor();
    await page.getByText('Pending review').first().waitFor();
    expect(await page.getByRole('listitem', { name: /Calibration run of/ }).textContent()).toMatch(/9[56]\.\d+ ± .*nm\/V/);
    await snapshot(page, 'build-editor-1280');

    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByRole('navigation', { name: 'Build editor sections' }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'build-editor-390');
    await page.getByRole('button', { name: 'Add a calibration run to Z bender pair' }).click();
    await page.getByLabel('Drive, point 1').waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page.getByRole('form', { name: 'New calibration run' }), 'build-editor-run-form-390');
    await page.getByRole('form', { name: 'New calibration run' }).getByRole('button', { name: 'Cancel' }).click();
    await page.setViewportSize({ width: 1280, height: 860 });

    await page.getByText("A moderator checks the write-up and runs. While it waits you can't edit it").first().waitFor();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByRole('button', { name: 'Save details' }).waitFor({ state: 'detached' });
    await page.getByText('Pending review', { exact: true }).first().waitFor();
    await snapshot(page, 'build-editor-submitted-1280');
    expect(j.errors).toEqual([]);
  });

  test("when demo-maker opens the editor of someone else's build, then a plain message says why it cannot be edited", async () => {
    const { page } = j.browser;
    const published = await Build.findOne({ where: { title: 'Beam-deflection AFM on a slate offcut' } });
    const othersDraft = await Build.findOne({ where: { title: 'Micromanipulator for pulling glass tips' } });
    await page.goto(`${j.live.baseUrl}/builds/${published!.id}/edit`);
    await page.getByText('Only the owner can edit this build').waitFor();
    await page.getByRole('link', { name: 'Read the build' }).waitFor();
    expect(await page.getByRole('button', { name: 'Save details' }).count()).toBe(0);
    await page.goto(`${j.live.baseUrl}/builds/${othersDraft!.id}/edit`);
    await page.getByText('No build to edit here').waitFor();
    await snapshot(page, 'build-editor-not-yours-1280', { fullPage: false });
  });
});
