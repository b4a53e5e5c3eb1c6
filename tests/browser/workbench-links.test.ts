// Workbench inputs live in the URL: a reload keeps them, a shared link opens the same result, a part page
// starts the expected-gain page, and a maker saves the mixer's matrix onto an XY pair of a build.
import { describe, expect, test } from 'vitest';
import { expectedGainCalculator } from '../../shared/workbench/calculators/expected-gain-calculator.ts';
import { formatWithUncertainty } from '../../shared/format/measured-number.ts';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { signIn } from '../support/login.ts';

describe('journey: workbench links', () => {
  const j = journey();

  test('when inputs are typed on the expected-gain page, then a reload and a shared link keep the inputs and the result', async () => {
    const { page, context } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench/expected-gain`);
    await page.getByRole('heading', { level: 1, name: 'Expected gain' }).waitFor();
    await page.getByRole('textbox', { name: 'Free length L (mm)', exact: true }).fill('20');
    await page.getByLabel(/Measured gain/).fill('250');
    await page.waitForURL(/lengthMm=20.*measuredNmPerV=250/);
    // 20 mm × 0.6 mm PZT-5A series bimorph: (3/2)·d31·L²/h² [S: Smits, Dalke & Cooney 1991; calc]
    const r = expectedGainCalculator.compute(
      expectedGainCalculator.input.parse({ actuator: 'bimorph-series', material: 'PZT-5A', lengthMm: 20, thicknessMm: 0.6 }),
    );
    const shown = `${formatWithUncertainty(r.gainNmPerV, null).value} nm/V`;
    const headline = page.locator('output').first();
    await expect.poll(() => headline.textContent()).toContain(shown);
    const before = await headline.textContent();

    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Expected gain' }).waitFor();
    expect(await page.getByRole('textbox', { name: 'Free length L (mm)', exact: true }).inputValue()).toBe('20');
    expect(await page.getByLabel(/Measured gain/).inputValue()).toBe('250');
    await expect.poll(() => page.locator('output').first().textContent()).toBe(before);

    const shared = await context.newPage();
    await shared.goto(page.url());
    await shared.getByRole('heading', { level: 1, name: 'Expected gain' }).waitFor();
    expect(await shared.getByRole('textbox', { name: 'Free length L (mm)', exact: true }).inputValue()).toBe('20');
    await expect.poll(() => shared.locator('output').first().textContent()).toBe(before);
    await shared.getByRole('button', { name: 'Copy link to this result' }).waitFor();
    await snapshot(shared, 'workbench-link-expected-gain');
    await shared.close();

    // A bad param falls back to its default: the page still opens and computes.
    await page.goto(`${j.live.baseUrl}/workbench/expected-gain?spec.lengthMm=abc&actuator=warp&materialKey=PZT-5H`);
    await page.getByRole('heading', { level: 1, name: 'Expected gain' }).waitFor();
    expect(await page.getByRole('textbox', { name: 'Free length L (mm)', exact: true }).inputValue()).toBe('12');
    expect(await page.getByLabel('Piezoceramic').inputValue()).toBe('PZT-5H');
  });

  test('when typed points are on the gain-fit page, then a reload keeps them; a pasted CSV says it is not kept', async () => {
    const { page } = j.browser;
    await page.goto(`${j.live.baseUrl}/workbench/fit?pts=0,0,u;5,520,u;10,1010,u;5,540,d;0,15,d&displacementUnit=nm`);
    await page.getByRole('heading', { level: 1, name: 'Gain fit' }).waitFor();
    const gain = page.getByRole('status', { name: 'Gain' });
    await gain.waitFor();
    const before = await gain.textContent();
    await page.reload();
    await expect.poll(() => page.getByRole('status', { name: 'Gain' }).textContent()).toBe(before);
    await page.getByRole('radio', { name: 'Paste or load a CSV' }).check();
    await page.getByText('pasted records are not kept in the link').waitFor();
  });

  test('when a part page links to the workbench, then the expected-gain page opens with its geometry', async () => {
    const { page } = j.browser;
    const part = await createPart({ name: `Link bar ${Date.now()}`, lengthMm: 15, thicknessMm: 0.5 });
    await page.goto(`${j.live.baseUrl}/parts/${part.id}`);
    await page.getByRole('navigation', { name: 'Open in the workbench' }).getByRole('link', { name: 'Expected gain' }).click();
    await page.getByRole('heading', { level: 1, name: 'Expected gain' }).waitFor();
    expect(await page.getByRole('textbox', { name: 'Free length L (mm)', exact: true }).inputValue()).toBe('15');
    expect(await page.getByRole('textbox', { name: 'Total thickness h (mm)', exact: true }).inputValue()).toBe('0.5');
  });

  test('when a maker saves the mixer result onto an XY pair, then the build page shows the drive matrix and its region', async () => {
    const { page } = j.browser;
    const maker = await createUser();
    const build = await createBuildRow(maker.id, { status: 'draft', title: `Mixer rig ${Date.now()}` });
    const part = await createPart();
    const agent = await signIn(j.live.t, maker.login);
    const created = await agent
      .post(`/api/builds/${build.id}/actuators`)
      .set('X-CSRF-Token', agent.csrf)
      .send({ partId: part.id, axis: 'XY', drive: 'pair-anti-phase', label: 'Tip pair' });
    expect(created.status).toBe(201);

    await page.goto(`${j.live.baseUrl}/auth/github?login=${maker.login}`);
    await page.getByTestId('signed-in-login').waitFor();
    await page.goto(`${j.live.baseUrl}/workbench/mixing?vaMinV=-100&vaMaxV=100&vbMinV=-100&vbMaxV=100&offsetXNm=40&offsetYNm=-25`);
    await page.getByRole('heading', { level: 1, name: 'Two-axis mixer' }).waitFor();
    const panel = page.getByRole('region', { name: 'Save onto an actuator' });
    await panel.getByLabel('Build').selectOption(String(build.id));
    await panel.getByLabel('XY actuator').selectOption(String(created.body.id));
    await panel.getByRole('button', { name: 'Save onto this actuator' }).click();
    await panel.getByRole('link', { name: 'Open the build' }).click();

    const matrix = page.getByRole('region', { name: 'Drive matrix' });
    await matrix.waitFor();
    await matrix.locator('[data-drawn-at]').first().waitFor();
    expect(await matrix.getByText('Reachable region, corners').count()).toBe(1);
    await snapshot(page, 'build-drive-matrix');
    // Limits ±100 V cross 42.4 V peak [S: IEC 61010-1, 6.3.1 — memory for the clause]
    await matrix.getByText('Hazardous voltage', { exact: false }).first().waitFor();
    expect(await matrix.textContent()).toMatch(/Offsets x₀, y₀\s*40(\.0*)?, [−-]25(\.0*)? nm/);
    expect(j.errors).toEqual([]);
  });
});
