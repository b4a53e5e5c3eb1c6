import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { randomInt } from 'node:crypto';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { journey, snapshot, pickListingPart } from '../support/browser.ts';

const DISC = 'Brass buzzer disc 27 mm';
/** A maker of this run only, so the part and listing below are ours alone in the shared database. */
const MAKER = `lens-maker-${randomInt(1e9)}`;
const PART = `Quartered tube 6.35 OD × 12 mm (${MAKER})`;
const PART_ALT = 'The quartered tube standing on its end, four silver electrodes on the outside';
const SPARE_ALT = 'A second view of the tube, lying down';
const LISTING_ALT = 'Five brass buzzer discs in a row on a cutting mat, leads still attached';
const REGION = `Gouda ${randomInt(1e6)}`;

/** A plain PNG in a colour no other test picks, so content-hash de-duplication never links two tests. */
async function pngFile(dir: string, name: string, width: number, height: number): Promise<string> {
  const path = join(dir, name);
  const background = { r: randomInt(256), g: randomInt(256), b: randomInt(256) };
  await writeFile(
    path,
    await sharp({ create: { width, height, channels: 3, background } })
      .png()
      .toBuffer(),
  );
  return path;
}

const uploaded = (page: Page, name: string) =>
  page
    .getByRole('progressbar', { name: `Upload of ${name}` })
    .and(page.locator('[aria-valuenow="100"][aria-valuetext="Uploaded"]'))
    .waitFor();

const noSideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

describe('journey: photos on registry parts and exchange listings', () => {
  const j = journey({ expectedConsole: /status of 404/ });
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'scanwright-attached-photos-'));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  test('when a maker proposes a part and adds photos with alt text on its page, then they show there, open large, and can be reordered, redescribed and deleted', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/auth/github?login=${MAKER}&returnTo=%2Fparts%2Fpropose`);
    await page.waitForURL(`${j.live.baseUrl}/parts/propose`);
    await page.getByLabel('Category').selectOption('tube');
    await page.getByLabel('Name', { exact: true }).fill(PART);
    await page.getByLabel('Outer diameter (mm)').fill('6.35');
    await page.getByLabel('Length (mm)').fill('12');
    await page.getByRole('button', { name: 'Propose this part' }).click();
    await page.getByRole('link', { name: 'Open its page' }).click();
    await page.getByRole('heading', { level: 1, name: PART }).waitFor();

    const photos = page.getByRole('region', { name: 'Photos', exact: true });
    await photos.getByText('No photos of this part yet.').waitFor();
    const manager = photos.getByRole('region', { name: 'Add, describe or remove photos' });
    const standing = await pngFile(dir, 'tube-standing.png', 900, 1200);
    const lying = await pngFile(dir, 'tube-lying.png', 1200, 600);
    await manager.getByLabel('Choose photos').setInputFiles([standing, lying]);
    await manager.getByRole('button', { name: 'Upload 2 photos' }).click();
    await manager.getByText('Describe the photo before uploading it.').first().waitFor();
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label') ?? document.activeElement?.id)).toMatch(
      /^alt-photo-/,
    );
    await manager.getByLabel('Alt text for tube-standing.png (required)').fill(PART_ALT);
    await manager.getByLabel('Alt text for tube-lying.png (required)').fill(SPARE_ALT);
    await manager.getByRole('button', { name: 'Upload 2 photos' }).click();
    await uploaded(page, 'tube-standing.png');
    await uploaded(page, 'tube-lying.png');

    const grid = page.getByRole('list', { name: 'Photos of this part' });
    await grid.getByRole('img', { name: PART_ALT }).waitFor();
    await grid.getByRole('img', { name: SPARE_ALT }).waitFor();
    expect(await photos.getByText('No photos of this part yet.').count()).toBe(0);
    await snapshot(page, 'part-photos-1280');

    await grid.getByRole('button', { name: PART_ALT }).click();
    const lightbox = page.getByRole('dialog', { name: 'Photo 1 of 2' });
    await lightbox.getByText(PART_ALT).waitFor();
    await page.keyboard.press('ArrowRight');
    await page.getByRole('dialog', { name: 'Photo 2 of 2' }).getByRole('img', { name: SPARE_ALT }).waitFor();
    await page.keyboard.press('Escape');
    await page.getByRole('dialog').waitFor({ state: 'detached' });

    // Move the second photo first: the page's grid follows, and focus stays on the moved photo's buttons.
    await manager.getByRole('button', { name: 'Move photo 2 earlier' }).click();
    await page.waitForFunction(
      (alt) => document.querySelector('[aria-label="Photos of this part"] img')?.getAttribute('alt') === alt,
      SPARE_ALT,
    );
    await page.waitForFunction(() => /^photo-\d+-down$/.test(document.activeElement?.id ?? ''));
    // Describe it better.
    const renamed = `${SPARE_ALT}, seen from one end`;
    const first = manager.getByRole('list', { name: 'Photos you can change' }).getByRole('listitem').first();
    await first.getByLabel('Alt text').fill(renamed);
    await first.getByRole('button', { name: 'Save' }).click();
    await grid.getByRole('img', { name: renamed }).waitFor();

    await manager.getByRole('button', { name: `Delete photo 1: ${renamed}` }).click();
    await manager.getByRole('button', { name: 'Yes, delete' }).click();
    await grid.getByRole('img', { name: renamed }).waitFor({ state: 'detached' });
    expect(await grid.getByRole('img').count()).toBe(1);
    expect(await manager.getByRole('list', { name: 'Photos you can change' }).getByRole('listitem').count()).toBe(1);

    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await grid.getByRole('img', { name: PART_ALT }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'part-photos-owner-390');
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  });

  test('when the maker posts a listing and adds a photo, then the listing page and its exchange card show it, and a visitor gets no upload controls', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/exchange/new`);
    await pickListingPart(page, 'buzzer', DISC, 'Buzzer disc');
    await page.getByLabel('Quantity').fill('5');
    // A swap, so the other journeys' "Free only" filters never meet this listing.
    await page.getByLabel('Swap', { exact: true }).check();
    await page.getByLabel('Region').fill(REGION);
    await page.getByRole('button', { name: 'Post listing' }).click();
    await page.getByRole('heading', { level: 1, name: `5 × ${DISC}` }).waitFor();
    const listingUrl = page.url();

    const manager = page.getByRole('region', { name: 'Your photos' });
    await manager.getByText('No photos yet.').waitFor();
    await page.getByText('No photos yet: a drawing of a buzzer disc.').waitFor();
    const discs = await pngFile(dir, 'discs.png', 1400, 900);
    await manager.getByLabel('Choose photos').setInputFiles(discs);
    await manager.getByLabel('Alt text for discs.png (required)').fill(LISTING_ALT);
    await manager.getByRole('button', { name: 'Upload 1 photo' }).click();
    await uploaded(page, 'discs.png');
    await page.getByRole('list', { name: 'Photos of this listing' }).getByRole('img', { name: LISTING_ALT }).waitFor();
    await manager.getByRole('list', { name: 'Photos you can change' }).getByRole('img', { name: LISTING_ALT }).waitFor();
    expect(await page.getByText('No photos yet: a drawing of a buzzer disc.').count()).toBe(0);
    await snapshot(page, 'listing-photos-1280');

    await page.goto(`${j.live.baseUrl}/exchange?region=${encodeURIComponent(REGION)}`);
    const card = page.getByRole('article').filter({ hasText: REGION });
    await card.getByRole('img', { name: LISTING_ALT }).waitFor();
    await snapshot(page, 'exchange-card-photo-1280');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().waitFor();
    await page.goto(listingUrl);
    await page.getByRole('heading', { level: 1, name: `5 × ${DISC}` }).waitFor();
    await page.getByRole('list', { name: 'Photos of this listing' }).getByRole('img', { name: LISTING_ALT }).waitFor();
    expect(await page.getByRole('region', { name: 'Your photos' }).count()).toBe(0);
    expect(await page.getByLabel('Choose photos').count()).toBe(0);

    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await page.getByRole('list', { name: 'Photos of this listing' }).getByRole('img', { name: LISTING_ALT }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'listing-photos-visitor-390');
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  });
});
