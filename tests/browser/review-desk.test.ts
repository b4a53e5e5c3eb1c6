import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';

const DAY = 86_400_000;

/** Sign in through the stand-in's picker by pressing the demo account's button. */
async function signInAsDemo(page: Page, baseUrl: string, login: string) {
  await page.goto(baseUrl);
  await page.getByRole('link', { name: 'Sign in', exact: true }).first().click();
  await page.getByRole('button', { name: new RegExp(login) }).click();
  await page.getByTestId('signed-in-login').waitFor();
}

describe('journey: a moderator works the review desk', () => {
  const j = journey();
  const tag = randomBytes(3).toString('hex');
  let owner: Awaited<ReturnType<typeof createUser>>;
  let toPublish: Awaited<ReturnType<typeof createBuildRow>>;
  let toReturn: Awaited<ReturnType<typeof createBuildRow>>;
  let partName: string;
  const note = `Please add a photo of the bimorph clamp and say which indicator you used (${tag}).`;

  beforeAll(async () => {
    owner = await createUser();
    const part = await createPart({ name: `Cartridge bimorph ${tag}` });
    partName = part.name;
    toPublish = await createBuildRow(owner.id, { status: 'submitted', title: `Cantilever stage ${tag}` });
    toReturn = await createBuildRow(owner.id, { status: 'submitted', title: `Tube scanner ${tag}` });
    await toPublish.update({ submittedAt: new Date(Date.now() - 3 * DAY) });
    await toReturn.update({ submittedAt: new Date(Date.now() - 2 * DAY) });
    for (const gain of [95, 104, 110, 118])
      await createRunRow({ buildId: toPublish.id, partId: part.id, ownerId: owner.id, gainNmPerV: gain, status: 'accepted' });
    const pending = await createRunRow({ buildId: toPublish.id, partId: part.id, ownerId: owner.id, gainNmPerV: 240, hysteresis: 0.3 });
    const reporter = await createUser();
    const { Report } = await import('../../server/models/report.model.ts');
    await Report.create({
      reporterId: reporter.id,
      targetType: 'run',
      targetId: pending.id,
      reason: 'wrong-data',
      note: `Looks like µm entered as nm (${tag}).`,
    });
  });

  test('when demo-moderator publishes one submitted build and returns another with a note, then the owner reads the note', async () => {
    const { page } = j.browser;

    await signInAsDemo(page, j.live.baseUrl, 'demo-moderator');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review desk' }).click();
    await page.getByRole('heading', { level: 1, name: 'Review desk' }).waitFor();
    await page.getByRole('tab', { name: /Builds submitted/ }).click();
    const rowOf = (title: string) => page.getByRole('list').getByRole('button', { name: new RegExp(title) });

    await rowOf(toPublish.title).click();
    const panel = page.getByRole('region', { name: 'Selected item' });
    await panel.getByRole('heading', { level: 2, name: toPublish.title }).waitFor();
    expect(await rowOf(toPublish.title).textContent()).toContain('3 days waiting');
    await snapshot(page, 'review-desk-build-1280');
    await panel.getByRole('button', { name: 'Publish', exact: true }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Published: ${toPublish.title}.` })
      .waitFor();
    await rowOf(toPublish.title).waitFor({ state: 'detached' });

    await rowOf(toReturn.title).click();
    await panel.getByRole('heading', { level: 2, name: toReturn.title }).waitFor();
    await panel.getByRole('button', { name: 'Return with notes' }).click();
    await panel.getByText('A note is required to return or decline.').waitFor();
    await panel.getByLabel('Note to the maker').fill(note);
    await panel.getByRole('button', { name: 'Return with notes' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Returned with notes: ${toReturn.title}.` })
      .waitFor();
    await rowOf(toReturn.title).waitFor({ state: 'detached' });
    const mail = await j.live.t.mail.waitFor((m) => m.subject.includes(toReturn.title));
    expect(mail.text).toContain(note);

    await page.getByRole('tab', { name: /Calibration runs pending/ }).click();
    await rowOf(partName).click();
    await panel.getByRole('heading', { level: 2, name: partName }).waitFor();
    await panel
      .getByText(/Large hysteresis/)
      .first()
      .waitFor();
    await panel.getByRole('table').waitFor();
    await panel.getByText('Quartiles and median').waitFor();
    await panel.getByText('Fitted line').waitFor();
    await snapshot(page, 'review-desk-run-1280');
    await rowOf(partName).press('k');
    await expect.poll(() => rowOf(partName).getAttribute('aria-current')).toBeNull();
    await page.locator('button[aria-current="true"]').press('j');
    await expect.poll(() => rowOf(partName).getAttribute('aria-current')).toBe('true');
    await expect.poll(() => rowOf(partName).evaluate((el) => el === document.activeElement)).toBe(true);

    await page.getByRole('tab', { name: /Reports open/ }).click();
    await rowOf(`Looks like µm entered as nm \\(${tag}\\)`).click();
    await panel.getByRole('link', { name: /Calibration run \d+ .*its build/ }).waitFor();
    await panel.getByRole('button', { name: 'Dismiss' }).click();
    await panel.getByText('Say what you did.').waitFor();
    await snapshot(page, 'review-desk-report-1280');

    await page.getByRole('link', { name: 'Audit trail' }).click();
    await page.getByRole('heading', { level: 1, name: 'Audit trail' }).waitFor();
    await page.getByRole('row').filter({ hasText: note }).filter({ hasText: 'Returned the build with notes' }).waitFor();
    await page.getByLabel('Thing').selectOption('build');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.waitForURL(/targetType=build/);
    await snapshot(page, 'review-audit-1280');

    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${j.live.baseUrl}/review?queue=builds`);
    await panel.waitFor();
    await panel.getByText('Loading the build…').waitFor({ state: 'hidden' });
    await snapshot(page, 'review-desk-build-390');
    await page.goto(`${j.live.baseUrl}/review?queue=runs`);
    await rowOf(partName).click();
    await panel.getByText('Quartiles and median').waitFor();
    await snapshot(page, 'review-desk-run-390');
    await page.goto(`${j.live.baseUrl}/review/audit`);
    await page.getByRole('row').filter({ hasText: note }).waitFor();
    await snapshot(page, 'review-audit-390');
    await page.setViewportSize({ width: 1280, height: 860 });

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in', exact: true }).first().waitFor();
    await page.goto(`${j.live.baseUrl}/auth/github?login=${owner.login}`);
    await page.getByTestId('signed-in-login').filter({ hasText: owner.login }).waitFor();
    await page.goto(`${j.live.baseUrl}/builds/mine`);
    const returned = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: toReturn.title }) });
    await returned.getByText(note).waitFor();
    await page
      .getByRole('listitem')
      .filter({ has: page.getByRole('heading', { name: toPublish.title }) })
      .getByText('Published')
      .first()
      .waitFor();
    await snapshot(page, 'review-returned-owner-1280');

    await page.goto(`${j.live.baseUrl}/review`);
    await page.getByText('Only moderators can open the review desk').waitFor();

    await page.getByRole('link', { name: 'Mail settings' }).click();
    const toggle = page.getByRole('switch', { name: 'Send me non-essential e-mail' });
    await expect(toggle.isChecked()).resolves.toBe(true);
    await toggle.click();
    await page.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();
    await expect(toggle.isChecked()).resolves.toBe(false);
    await page.setViewportSize({ width: 390, height: 844 });
    await snapshot(page, 'account-settings-390');
    // The maker's own pages stay in a bar under the header at every width.
    await page.getByRole('navigation', { name: 'Your pages' }).getByRole('link', { name: 'Mail settings' }).waitFor();
    await page.getByRole('button', { name: 'Menu' }).click();
    await snapshot(page, 'account-menu-390', { fullPage: false });
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  }, 150_000);
});
