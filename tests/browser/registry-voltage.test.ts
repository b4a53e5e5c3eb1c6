import { describe, expect, test } from 'vitest';
import { randomBytes } from 'node:crypto';
import { journey, snapshot } from '../support/browser.ts';
import { createPart } from '../support/factories.ts';

const TAG = `volt${randomBytes(3).toString('hex')}`;

describe('journey: the registry by voltage rating', () => {
  const j = journey();

  test('when a visitor asks for parts rated for at least 60 V, then lower-rated ones go, unrated ones are counted and can be shown', async () => {
    const ratings = [30, 60, 150, null, null];
    for (const [i, v] of ratings.entries())
      await (await createPart({ name: `${TAG} bar ${i}`, status: 'accepted' })).update({ safeVolts: v });
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/parts?q=${TAG}`);
    const table = page.getByRole('table');
    await table.getByRole('link', { name: `${TAG} bar 0` }).waitFor();

    await page.getByLabel('Rated for at least (V)').fill('60');
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL(/minVolts=60/);
    await table.getByRole('link', { name: `${TAG} bar 0` }).waitFor({ state: 'detached' });
    await page.getByText('2 parts with no stated rating are hidden').waitFor();
    expect(await table.getByRole('link', { name: new RegExp(`^${TAG} bar`) }).count()).toBe(2);
    await snapshot(page, 'registry-rated-at-least-1280');

    await page.getByRole('button', { name: 'show them' }).click();
    await page.waitForURL(/unrated=include/);
    await table.getByRole('link', { name: `${TAG} bar 3` }).waitFor();
    expect(await table.getByRole('link', { name: new RegExp(`^${TAG} bar`) }).count()).toBe(4);
    await page.getByRole('button', { name: 'hide them' }).click();
    await table.getByRole('link', { name: `${TAG} bar 3` }).waitFor({ state: 'detached' });

    await page.getByLabel('Rated for at most (V)').fill('100');
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL(/minVolts=60&maxVolts=100/);
    await table.getByRole('link', { name: `${TAG} bar 2` }).waitFor({ state: 'detached' });
    expect(await table.getByRole('link', { name: new RegExp(`^${TAG} bar`) }).count()).toBe(1);

    await page.setViewportSize({ width: 390, height: 844 });
    await snapshot(page, 'registry-rated-at-least-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    expect(j.errors).toEqual([]);
  });
});
