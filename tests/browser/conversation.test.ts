// Journey: the conversation around a build. A fan follows and comments, the owner is notified and answers,
// a moderator returns a submitted build, the maker answers in the review thread and resubmits, and the
// moderator reads the thread and the diff on the desk and publishes with the run; the fan, who follows the maker
// and the part, hears of both.
import { randomBytes } from 'node:crypto';
import { describe, expect, test } from 'vitest';
import type { Page } from 'playwright-core';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';

/** Sign in as this account through the local OAuth stand-in, landing on `path`. */
async function as(page: Page, baseUrl: string, login: string, path: string) {
  await page.goto(`${baseUrl}/auth/github?login=${login}&returnTo=${encodeURIComponent(path)}`);
  await page.getByTestId('signed-in-login').filter({ hasText: login }).first().waitFor();
}

describe('journey: talking around a build', () => {
  const j = journey();
  const tag = randomBytes(3).toString('hex');

  test('when a fan comments, the owner answers, a build is returned, answered in its thread, resubmitted and published, then each side is told', async () => {
    const { page } = j.browser;
    const base = j.live.baseUrl;
    const owner = await createUser({ login: `thread-owner-${tag}` });
    const fan = await createUser({ login: `thread-fan-${tag}` });
    const shown = await createBuildRow(owner.id, { status: 'published', title: `Bender pair ${tag}` });
    const submitted = await createBuildRow(owner.id, { status: 'submitted', title: `Flexure XY ${tag}` });
    const part = await createPart({ status: 'accepted', name: `Thread bar ${tag}` });
    await createRunRow({ buildId: submitted.id, partId: part.id, ownerId: owner.id, gainNmPerV: 70.4 });

    // The fan follows the build and its maker, and asks a question.
    await as(page, base, fan.login, `/builds/${shown.id}`);
    await page.getByRole('button', { name: 'Follow this build' }).click();
    await page.getByRole('button', { name: `Following this build` }).waitFor();
    await page.getByRole('button', { name: `Follow ${owner.login}` }).click();
    await page.getByRole('button', { name: `Following ${owner.login}` }).waitFor();
    await page.goto(`${base}/parts/${part.id}`);
    await page.getByRole('button', { name: 'Follow this part' }).click();
    await page.getByRole('button', { name: 'Following this part' }).waitFor();
    await page.goto(`${base}/builds/${shown.id}`);
    await page.getByLabel('Your comment (Markdown)').fill('Which **clamp** holds the bar at the root?');
    await page.getByRole('button', { name: 'Post comment' }).click();
    await page.getByRole('listitem').filter({ hasText: 'Which clamp holds the bar at the root?' }).waitFor();
    await snapshot(page, 'conversation-fan-1280');

    // The owner sees the badge, opens the notification and answers.
    await as(page, base, owner.login, '/');
    const yours = page.getByRole('navigation', { name: 'Your pages' });
    await yours.getByRole('link', { name: /Notifications 1 unread/ }).click();
    await page.getByRole('link', { name: new RegExp(`${fan.login} commented on your build`) }).click();
    await page.waitForURL(new RegExp(`/builds/${shown.id}#comment-`));
    await page.getByLabel('Your comment (Markdown)').fill('A brass clamp, 3 mm from the end.');
    await page.getByRole('button', { name: 'Post comment' }).click();
    await page.getByRole('listitem').filter({ hasText: 'A brass clamp, 3 mm from the end.' }).waitFor();
    await expect.poll(async () => yours.getByRole('link', { name: 'Notifications', exact: true }).count()).toBe(1);

    // A moderator returns the submitted build with a note.
    const note = `Say which indicator you used (${tag}).`;
    await as(page, base, 'demo-moderator', `/review?queue=builds&item=${submitted.id}`);
    const panel = page.getByRole('region', { name: 'Selected item' });
    await panel.getByRole('heading', { level: 2, name: submitted.title }).waitFor();
    await panel.getByLabel('Note to the maker').fill(note);
    await panel.getByRole('button', { name: 'Return with notes' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Returned with notes: ${submitted.title}.` })
      .waitFor();

    // The maker reads it in the editor's review thread, answers, and submits again.
    await as(page, base, owner.login, '/notifications');
    await page.getByRole('link', { name: new RegExp(`Your build "${submitted.title}" was returned`) }).waitFor();
    await page.goto(`${base}/builds/${submitted.id}/edit#review`);
    const thread = page.locator('#review-thread');
    await thread.getByText(note).waitFor();
    await thread.getByLabel('Write to the moderators (Markdown)').fill('A **dial indicator**, 1 µm per division; now in the run notes.');
    await thread.getByRole('button', { name: 'Send to the thread' }).click();
    await thread.getByText('1 µm per division').waitFor();
    await snapshot(page, 'conversation-maker-thread-1280');
    await page.getByLabel('Write-up', { exact: true }).fill('The dial indicator sits on a magnetic base beside the clamp.');
    await page.getByRole('button', { name: 'Save details' }).click();
    await page.getByText('Details saved.').waitFor();
    await page.getByRole('button', { name: 'Submit again for review' }).click();
    await page.getByRole('button', { name: 'Submit again for review' }).waitFor({ state: 'detached' });

    // The moderator is told, reads the answer on the desk and publishes.
    await as(page, base, 'demo-moderator', '/notifications');
    await page.getByRole('link', { name: new RegExp(`${owner.login} wrote in the review thread of “${submitted.title}”`) }).waitFor();
    await page.goto(`${base}/review?queue=builds&item=${submitted.id}`);
    await panel.getByRole('heading', { level: 2, name: submitted.title }).waitFor();
    await panel.locator('#review-thread').getByText('1 µm per division').waitFor();
    await panel.getByLabel('Write-up changes').locator('ins', { hasText: 'magnetic base' }).first().waitFor();
    await snapshot(page, 'conversation-desk-1280');
    await panel.getByRole('button', { name: 'Publish and accept the runs without flags…' }).click();
    const preview = panel.getByRole('region', { name: 'Preview of the combined decision' });
    await preview.getByText(/accept this run, which carries no flag/).waitFor();
    await preview.getByRole('button', { name: /^Confirm: publish, accept 1/ }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Published, with its runs without flags accepted: ${submitted.title}.` })
      .waitFor();

    // The fan, who follows the maker and the part, hears of the new build and of the run that now counts.
    await as(page, base, fan.login, '/notifications');
    await page.getByRole('link', { name: new RegExp(`${owner.login} published a new build: “${submitted.title}”`) }).waitFor();
    await page.getByRole('link', { name: new RegExp(`A new run counts for ${part.name}`) }).waitFor();
    await page.setViewportSize({ width: 390, height: 844 });
    await snapshot(page, 'conversation-fan-notifications-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  });
});
