import { describe, expect, test } from 'vitest';
import { journey, snapshot } from '../support/browser.ts';
import { createBuildRow, createUser } from '../support/factories.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { peakToPeakGain } from '../../shared/workbench/peak-to-peak.ts';

describe('journey: a maker turns an indicator reading into a stored run from the peak-to-peak page', () => {
  const j = journey();

  test('when the maker records the reading on a new actuator of a draft, then the stored run holds the same gain the page showed', async () => {
    const { page } = j.browser;
    const { live } = j;
    const user = await createUser();
    const build = await createBuildRow(user.id, { title: 'Bench stage for the record test' });
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`${live.baseUrl}/auth/github?login=${user.login}`);
    await page.getByTestId('signed-in-login').waitFor();
    await page.goto(`${live.baseUrl}/workbench/peak-to-peak`);
    await page.getByLabel('Peak-to-peak swing Δx').fill('7.4');
    await page.getByLabel('Reading resolution').fill('0.2');
    await page.getByLabel('Peak-to-peak voltage ΔV').fill('96');

    const panel = page.getByRole('region', { name: 'Record as a run' });
    await panel.getByRole('button', { name: 'Record as a run…' }).click();
    const form = page.getByRole('region', { name: 'Record as a run' });
    await form.getByLabel('Build').selectOption({ label: `${build.title} (draft)` });
    await form.getByLabel('Actuator').selectOption('new');
    await form.getByRole('radio').first().check();
    await form.getByLabel('Label (optional)').fill('Y bender');
    await form.getByLabel('Axis').selectOption('Y');
    await form.getByRole('button', { name: 'Add this actuator' }).click();
    await form.getByLabel('Actuator').locator('option', { hasText: 'Y bender' }).waitFor({ state: 'attached' });
    await form.getByLabel('Drive frequency (Hz)').fill('2');
    await form.getByLabel('Measured on').fill('2026-11-28');
    await snapshot(page, 'record-as-run-peak-to-peak-1366');
    await form.getByRole('button', { name: 'Record this run' }).click();
    await page.getByText(/Recorded: run of 28 Nov 2026 on Y bender/).waitFor();

    // The page's figure and the stored one come from the same shared code [calc]: 7400 nm / 96 V, u from 0.2 µm divisions.
    const expected = peakToPeakGain({ displacementPpNm: 7400, voltsPpV: 96, displacementResolutionNm: 200 });
    const run = await CalibrationRun.findOne({ where: { buildId: build.id } });
    expect(run).toMatchObject({
      kind: 'peak-to-peak',
      status: 'pending',
      measuredOn: '2026-11-28',
      displacementUnit: 'um',
      method: 'indicator',
    });
    expect(run!.gainNmPerV).toBeCloseTo(expected.gainNmPerV, 9);
    expect(run!.gainStdErrNmPerV).toBeCloseTo(expected.gainStdUncNmPerV, 9);
    expect(JSON.parse(run!.driveJson!)).toEqual({ kind: 'sine', frequencyHz: 2, amplitudeV: 48 });

    await page.getByRole('link', { name: 'Open the build editor' }).click();
    await page.getByText('Peak-to-peak reading', { exact: false }).first().waitFor();
    await snapshot(page, 'record-as-run-editor-1366');
    expect(j.errors).toEqual([]);
  });
});
