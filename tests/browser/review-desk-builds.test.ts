// The builds tab as a place to decide a build and its runs: each run's gain with its ±, flags, plot and raw
// points; the combined decision with its preview; and a resubmitted build showing what changed since review.
import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { decideBuild } from '../../server/services/review.service.ts';
import { toActor } from '../../server/services/user.service.ts';
import { Build } from '../../server/models/build.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';

const DAY = 86_400_000;

describe('journey: a moderator decides a build with its runs from the builds tab', () => {
  const j = journey();
  const tag = randomBytes(3).toString('hex');
  let combined: Awaited<ReturnType<typeof createBuildRow>>;
  let resubmitted: Awaited<ReturnType<typeof createBuildRow>>;
  let edited: Awaited<ReturnType<typeof createBuildRow>>;
  const runIds: { clean: number[]; loopy: number } = { clean: [], loopy: 0 };
  const earlierNote = `Say how the coarse approach is geared (${tag}).`;

  beforeAll(async () => {
    const owner = await createUser();
    combined = await createBuildRow(owner.id, { status: 'submitted', title: `Bimorph stage ${tag}` });
    await combined.update({ submittedAt: new Date(Date.now() - 20 * DAY) });
    for (const gain of [40, 41]) {
      const part = await createPart({ name: `Buzzer disc ${gain} ${tag}` });
      runIds.clean.push((await createRunRow({ buildId: combined.id, partId: part.id, ownerId: owner.id, gainNmPerV: gain })).id);
    }
    const loopyPart = await createPart({ name: `Loose stack ${tag}` });
    runIds.loopy = (
      await createRunRow({ buildId: combined.id, partId: loopyPart.id, ownerId: owner.id, gainNmPerV: 39, hysteresis: 0.5 })
    ).id;

    // A build another moderator returned with a note, then edited and submitted again.
    resubmitted = await createBuildRow(owner.id, { status: 'submitted', title: `Walker head ${tag}` });
    await resubmitted.update({ body: 'A shear-stack walker. Coarse approach by screw.', submittedAt: new Date(Date.now() - 19 * DAY) });
    const other = await createUser({ role: 'moderator' });
    await decideBuild(toActor(other), resubmitted.id, { decision: 'return', note: earlierNote });
    await Build.update(
      {
        status: 'submitted',
        body: 'A shear-stack walker. Coarse approach by a 100:1 worm gear.',
        submittedAt: new Date(Date.now() - 19 * DAY),
      },
      { where: { id: resubmitted.id } },
    );
    // A build published, then edited by its maker: the "edited since review" queue.
    edited = await createBuildRow(owner.id, { status: 'submitted', title: `Inertial slider ${tag}` });
    await edited.update({ body: 'Slider on sapphire rails.' });
    await decideBuild(toActor(other), edited.id, { decision: 'publish' });
    await Build.update(
      { body: 'Slider on sapphire rails, preloaded by a leaf spring.', editedSinceReview: true },
      { where: { id: edited.id } },
    );
  });

  test('when the moderator previews and confirms publish-with-runs, then the clean runs are accepted and the flagged one waits; a resubmission shows its diff', async () => {
    const { page } = j.browser;
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`${j.live.baseUrl}/auth/github?login=demo-moderator&returnTo=/review?queue=builds`);
    await page.getByTestId('signed-in-login').filter({ hasText: 'demo-moderator' }).waitFor();
    await page.getByRole('heading', { level: 1, name: 'Review desk' }).waitFor();
    const rowOf = (title: string) => page.getByRole('list').getByRole('button', { name: new RegExp(title) });
    const panel = page.getByRole('region', { name: 'Selected item' });

    // The resubmitted build: earlier note, write-up diff and run list.
    await rowOf(resubmitted.title).click();
    await panel.getByRole('heading', { level: 2, name: resubmitted.title }).waitFor();
    await panel.getByRole('blockquote').filter({ hasText: earlierNote }).waitFor();
    const diff = panel.getByLabel('Write-up changes');
    await diff.locator('ins', { hasText: 'worm gear' }).first().waitFor();
    await diff.locator('del', { hasText: 'screw' }).first().waitFor();
    await snapshot(page, 'review-desk-resubmitted-1366');

    // The combined build: each run with its ± and what it is, flags, plot and raw points.
    await rowOf(combined.title).click();
    await panel.getByRole('heading', { level: 2, name: combined.title }).waitFor();
    const runCard = (id: number) => panel.getByRole('listitem', { name: new RegExp(`^Run ${id}:`) });
    await runCard(runIds.clean[0]!)
      .getByText(/± .* nm\/V \(95 %\)/)
      .waitFor();
    await runCard(runIds.loopy)
      .getByText(/Hysteresis .* exceeds/)
      .waitFor();
    await runCard(runIds.clean[0]!).getByText('Fitted line').waitFor();
    await runCard(runIds.clean[0]!).getByRole('button', { name: 'Show the raw points' }).click();
    const points = runCard(runIds.clean[0]!).getByRole('table');
    await points.getByRole('columnheader', { name: 'volts_V' }).waitFor();
    await runCard(runIds.clean[0]!)
      .getByText(/Page 1 of 1 · \d+ rows/)
      .waitFor();
    // Accept with note: the button says so once a note is written.
    await runCard(runIds.loopy).getByLabel('Note on this run').fill('Looks fine to me.');
    await runCard(runIds.loopy).getByRole('button', { name: 'Accept with note' }).waitFor();
    await runCard(runIds.loopy).getByLabel('Note on this run').fill('');

    await panel.getByRole('button', { name: 'Publish and accept the runs without flags…' }).click();
    const preview = panel.getByRole('region', { name: 'Preview of the combined decision' });
    await preview.getByText(`publish the build “${combined.title}”`).waitFor();
    await preview.getByText(/accept these 2 runs, which carry no flag/).waitFor();
    await preview.getByText(/Loose stack .*\(.*Large hysteresis.*\)/).waitFor();
    await snapshot(page, 'review-desk-publish-preview-1366');
    await page.setViewportSize({ width: 390, height: 844 });
    await preview.scrollIntoViewIfNeeded();
    await snapshot(page, 'review-desk-publish-preview-390');
    await page.setViewportSize({ width: 1366, height: 900 });
    await preview.getByRole('button', { name: 'Confirm: publish, accept 2' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Published, with its runs without flags accepted: ${combined.title}.` })
      .waitFor();
    await rowOf(combined.title).waitFor({ state: 'detached' });
    const statuses = await CalibrationRun.findAll({ where: { buildId: combined.id }, order: [['id', 'ASC']] });
    expect(statuses.map((r) => r.status)).toEqual(['accepted', 'accepted', 'pending']);
    expect((await Build.findByPk(combined.id))?.status).toBe('published');

    // The flagged run waits in the runs queue.
    await page.getByRole('tab', { name: /Calibration runs pending/ }).click();
    await rowOf(`Loose stack ${tag}`).waitFor();

    // Edited since review: the same diff against what was published.
    await page.getByRole('tab', { name: /Edited since review/ }).click();
    await rowOf(edited.title).click();
    await panel.getByRole('heading', { level: 3, name: 'Edited since review: what changed' }).waitFor();
    await panel.getByLabel('Write-up changes').locator('ins', { hasText: 'leaf spring' }).first().waitFor();
    await snapshot(page, 'review-desk-edited-1366');

    await page.goto(`${j.live.baseUrl}/review?queue=builds&item=${resubmitted.id}`);
    await panel.getByRole('blockquote').filter({ hasText: earlierNote }).waitFor();
    await page.setViewportSize({ width: 390, height: 844 });
    await snapshot(page, 'review-desk-resubmitted-390');
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(j.errors).toEqual([]);
  }, 150_000);
});
