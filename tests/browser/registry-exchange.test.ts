import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot, pickListingPart } from '../support/browser.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';
import { DEMO_BUILDS } from '../../server/db/seed/demo-builds.ts';

const partName = (key: string) => DEMO_PARTS.find((p) => p.key === key)!.name;
const BAR = partName('cartridge-bar');
const DISC = partName('buzzer-27');
const STACK = partName('stack-5x5');
/** The seed's accepted gains on a part (nm/V). */
const acceptedGains = (key: string) =>
  DEMO_BUILDS.flatMap((b) => b.actuators.filter((a) => a.part === key).flatMap((a) => a.runs))
    .filter((r) => r.status === 'accepted')
    .map((r) => r.gainNmPerV);
/** A gain filter around the bar's seeded runs: 20 % below the lowest, up to 150 nm/V. */
const GAIN_FROM = Math.floor(Math.min(...acceptedGains('cartridge-bar')) * 0.8);
const GAIN_TO = 150;
const MESSAGE = 'Hello Marit, could I have two of the cartridge bars for an XY pair? Happy to pay postage to Utrecht.';

const noSideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

describe('journey: parts registry and exchange', () => {
  const j = journey({ expectedConsole: /status of 404/ });

  test('when demo-maker filters by gain around the bar runs, opens the cartridge bar and writes to marit-builds, then marit-builds reads it in the inbox', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/auth/github?returnTo=%2Fparts`);
    await page.getByRole('heading', { name: /Sign in \(local stand-in\)/ }).waitFor();
    await page.getByRole('button', { name: /demo-maker/ }).click();
    await page.waitForURL(`${j.live.baseUrl}/parts`);
    await page.getByRole('heading', { level: 1, name: 'Parts registry' }).waitFor();
    const table = page.getByRole('table');
    await table.getByRole('link', { name: DISC }).waitFor();
    expect(await page.getByRole('link', { name: 'Propose a part' }).count()).toBe(1);
    expect(await page.getByRole('img', { name: /Where listed parts cluster/ }).count()).toBe(1);
    await snapshot(page, 'parts-registry-1280');

    // The filter leaves the disc and the stack out only if their seeded gains lie outside it.
    for (const other of ['buzzer-27', 'stack-5x5']) expect(Math.max(...acceptedGains(other))).toBeLessThan(GAIN_FROM);
    await page.getByLabel('Gain from (nm/V)').fill(String(GAIN_FROM));
    await page.getByLabel('Gain to (nm/V)').fill(String(GAIN_TO));
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL(new RegExp(`/parts\\?gainMin=${GAIN_FROM}&gainMax=${GAIN_TO}$`));
    await table.getByRole('link', { name: DISC }).waitFor({ state: 'detached' });
    await table.getByRole('link', { name: BAR }).waitFor();
    expect(await table.getByRole('link', { name: STACK }).count()).toBe(0);
    expect(await table.getByRole('row').nth(1).textContent()).toMatch(/\d+ nm\/V/);

    const csv = await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href');
    expect(csv).toBe(`/api/parts?gainMin=${GAIN_FROM}&gainMax=${GAIN_TO}&sort=name&format=csv`);
    const download = await page.request.get(`${j.live.baseUrl}${csv}`);
    expect(download.headers()['content-type']).toContain('text/csv');
    expect(await download.text()).toContain(BAR);

    await table.getByRole('button', { name: /Median gain/ }).click();
    await page.waitForURL(/sort=-gain/);
    await table.locator('th[aria-sort="descending"]', { hasText: 'Median gain' }).waitFor();
    // The rows are re-sorted when the new page arrives; until then the old rows stay, dimmed and marked busy.
    await page.locator('[role="region"][aria-label="Parts"][aria-busy="false"]').waitFor();
    await snapshot(page, 'parts-registry-filtered-1280');

    await table.getByRole('link', { name: BAR }).click();
    await page.getByRole('heading', { level: 1, name: BAR }).waitFor();
    const plot = page.getByTestId('part-runs-plot');
    const drawn = plot.locator('[data-drawn-at]');
    await drawn.waitFor();
    expect(Number(await drawn.getAttribute('data-markers'))).toBeGreaterThanOrEqual(4);
    expect(await page.getByRole('alert').filter({ hasText: 'Hazardous voltage: this part is rated up to 60 V' }).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Report' }).count()).toBe(1);
    await page.getByRole('button', { name: 'Report' }).click();
    const dialog = page.getByRole('dialog', { name: 'Report this part' });
    await dialog.getByRole('button', { name: 'Send report' }).click();
    await dialog.getByText('Pick a reason.').waitFor();
    await dialog.getByLabel('Reason').selectOption('duplicate');
    await dialog.getByLabel(/^Note/).fill('Same bar as the one listed from Dual cartridges, I think.');
    await dialog.getByRole('button', { name: 'Send report' }).click();
    await dialog.getByRole('status').filter({ hasText: 'your report is with the moderators' }).waitFor();
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'hidden' });
    await snapshot(page, 'part-page-1280');

    await page.getByRole('region', { name: 'On the exchange' }).getByRole('link', { name: '3 from marit-builds' }).click();
    await page.getByRole('heading', { level: 1, name: `3 × ${BAR}` }).waitFor();
    await page.getByText("Your message goes to marit-builds through Scanwright; neither of you sees the other's e-mail address.").waitFor();
    await page.getByLabel('Message').fill(MESSAGE);
    await page.getByRole('button', { name: 'Send message' }).click();
    await page.getByRole('status').filter({ hasText: 'Sent.' }).waitFor();
    await snapshot(page, 'listing-message-sent-1280');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().waitFor();
    await page.goto(`${j.live.baseUrl}/auth/github?login=marit-builds&returnTo=%2Finbox`);
    await page.waitForURL(`${j.live.baseUrl}/inbox`);
    await page.getByRole('heading', { level: 1, name: 'Inbox' }).waitFor();
    const thread = page.getByRole('listitem').filter({ hasText: 'demo-maker' });
    await thread.getByText('1 unread').waitFor();
    expect(await thread.textContent()).toContain('Hello Marit');
    await snapshot(page, 'inbox-1280');

    await thread.getByRole('link', { name: 'demo-maker' }).click();
    await page.getByRole('heading', { level: 1, name: 'Conversation with demo-maker' }).waitFor();
    await page.getByRole('list', { name: 'Messages' }).getByText(MESSAGE).waitFor();
    await page.getByLabel('Reply to demo-maker').fill('Yes, two are yours. I will post them on Monday.');
    await page.getByRole('button', { name: 'Send reply' }).click();
    await page.getByRole('list', { name: 'Messages' }).getByText('I will post them on Monday.').waitFor();
    await snapshot(page, 'inbox-thread-1280');
    expect(j.errors).toEqual([]);
  });

  test('when marit-builds proposes a part, then the page says it waits for a moderator', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/parts/propose`);
    await page.getByLabel('Category').selectOption('tube');
    await page.getByLabel('Name', { exact: true }).fill('Short quartered tube 3.2 OD × 6 mm');
    await page.getByLabel('Outer diameter (mm)').fill('3.2');
    await page.getByLabel('Length (mm)').fill('6');
    await page.getByLabel('Wall thickness (mm)').fill('0.4');
    await page.getByLabel('Material family').selectOption('PZT-5H');
    await page.getByLabel('Safe voltage (V)').fill('120');
    await snapshot(page, 'propose-part-1280');
    await page.getByRole('button', { name: 'Propose this part' }).click();
    await page.getByRole('status').filter({ hasText: 'Proposed: waiting for a moderator' }).waitFor();
    await page.getByRole('link', { name: 'Open its page' }).click();
    await page.getByRole('heading', { level: 1, name: 'Short quartered tube 3.2 OD × 6 mm' }).waitFor();
    await page.getByText('Only its proposer and the moderators can see this page').waitFor();
    expect(j.errors).toEqual([]);
  });

  test('when marit-builds posts a listing seeking buzzer discs for a price, then its page shows it with the price', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/exchange/new`);
    await pickListingPart(page, 'buzzer', DISC, 'Buzzer disc');
    await page.getByLabel('Seeking: I am looking for parts').check();
    await page.getByLabel('Quantity').fill('4');
    await page.getByLabel('For a price').check();
    await page.getByLabel('Amount').fill('1.50');
    await page.getByLabel('Currency').fill('eur');
    await page.getByLabel('Region').fill('Hamburg');
    await page.getByLabel('Ships to').fill('EU');
    await snapshot(page, 'listing-new-1280');
    await page.getByRole('button', { name: 'Post listing' }).click();
    await page.getByRole('heading', { level: 1, name: `4 × ${DISC}` }).waitFor();
    expect(await page.getByRole('region', { name: 'Your listing' }).getByRole('button', { name: 'Mark reserved' }).count()).toBe(1);
    await page.getByText('1.50 EUR').waitFor();
    await snapshot(page, 'listing-own-1280');
    expect(j.errors).toEqual([]);
  });

  test('when the pages are 390 px wide, then nothing scrolls sideways and the registry rows keep name and median gain', async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${j.live.baseUrl}/parts?gainMin=${GAIN_FROM}&gainMax=${GAIN_TO}`);
    await page.getByRole('table').getByRole('link', { name: BAR }).waitFor();
    expect(await noSideways(page)).toBe(true);
    const table = page.getByRole('table');
    expect(await table.evaluate((el) => el.scrollWidth <= el.clientWidth)).toBe(true);
    expect(await table.getByRole('row', { name: BAR }).innerText()).toMatch(/\d+(\.\d+)? nm\/V/);
    await snapshot(page, 'parts-registry-390');

    await page.getByRole('table').getByRole('link', { name: BAR }).click();
    await page.getByTestId('part-runs-plot').locator('[data-drawn-at]').waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'part-page-390');

    await page.goto(`${j.live.baseUrl}/exchange`);
    await page.getByRole('link', { name: new RegExp(STACK) }).waitFor();
    await page.getByLabel('Free only').check();
    await page.waitForURL(/freeOnly=true/);
    await page.getByRole('link', { name: new RegExp(STACK) }).waitFor({ state: 'detached' });
    await page.getByRole('link', { name: new RegExp(DISC) }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'exchange-390');

    await page.goto(`${j.live.baseUrl}/exchange/mine`);
    await page.getByRole('heading', { level: 1, name: 'My listings' }).waitFor();
    await page.getByRole('link', { name: `3 × ${BAR}`, exact: true }).waitFor();
    await page.getByRole('button', { name: `Mark reserved: 3 × ${BAR}` }).click();
    await page.getByRole('button', { name: `Reopen: 3 × ${BAR}` }).waitFor();
    expect(await page.getByRole('listitem').filter({ hasText: BAR }).getByText('Reserved', { exact: true }).count()).toBe(1);
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'my-listings-390');

    await page.goto(`${j.live.baseUrl}/inbox`);
    await page.getByRole('link', { name: 'demo-maker' }).click();
    await page.getByRole('list', { name: 'Messages' }).waitFor();
    expect(await noSideways(page)).toBe(true);
    await snapshot(page, 'inbox-thread-390');
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  });
});
