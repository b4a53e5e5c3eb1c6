import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { recomputeNonlinearity, up } from '../../server/db/migrations/20261202100000-recompute-run-fits.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { runColumns } from '../../server/services/run.service.ts';
import { fitRun } from '../../shared/workbench/run-fit.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const migrateUp = () => up({ name: '20261202100000-recompute-run-fits', context: t.handle.sequelize.getQueryInterface() });
/** The same recomputation limited to this file's rows, so parallel test files are not touched. */
const recompute = (...ids: number[]) => recomputeNonlinearity(t.handle.sequelize.getQueryInterface(), ids);

/** A perfectly linear part with a symmetric loop: up 10·V + 2·sin(πV/4), down 10·V − 2·sin(πV/4), V = 0..4. */
const volts = [0, 1, 2, 3, 4];
const loop = (V: number) => 2 * Math.sin((Math.PI * V) / 4);
const points = [
  ...volts.map((V) => ({ volts: V, displacement: 10 * V + loop(V), sweep: 'up' as const })),
  ...volts.toReversed().map((V) => ({ volts: V, displacement: 10 * V - loop(V), sweep: 'down' as const })),
];
const input = {
  kind: 'points' as const,
  points,
  voltageUnit: 'V' as const,
  displacementUnit: 'nm' as const,
  model: 'intercept' as const,
  method: 'indicator' as const,
};

/** The superseded figure, by hand: max |residual| / span × 100 with the line x = 10·V (symmetry) and span 10 nm/V × 4 V. */
const oldNonlinearityPct = (Math.max(...points.map((p) => Math.abs(p.displacement - 10 * p.volts))) / 40) * 100;

const fitFigures = (r: CalibrationRun) => ({
  pointCount: r.pointCount,
  gainNmPerV: r.gainNmPerV,
  gainStdErrNmPerV: r.gainStdErrNmPerV,
  gainCi95LoNmPerV: r.gainCi95LoNmPerV,
  gainCi95HiNmPerV: r.gainCi95HiNmPerV,
  interceptNm: r.interceptNm,
  r2: r.r2,
  residualStdNm: r.residualStdNm,
  spanNm: r.spanNm,
  nonlinearityPctFs: r.nonlinearityPctFs,
  hysteresisPctFs: r.hysteresisPctFs,
});

async function storedRuns() {
  const owner = await createUser();
  const build = await createBuildRow(owner.id);
  const part = await createPart();
  const base = { buildId: build.id, partId: part.id, ownerId: owner.id, status: 'accepted' as const };
  const loopRun = await createRunRow({ ...base, gainNmPerV: 10 });
  await loopRun.update({ ...runColumns(input, fitRun(input)), nonlinearityPctFs: oldNonlinearityPct });
  const other = await createRunRow({ ...base, gainNmPerV: 55 });
  return { loopRun, other };
}

describe('migration 20261202100000-recompute-run-fits', () => {
  test('when a run holds the old max-residual nonlinearity of a symmetric loop, then up stores the calibration-curve figure, ~0', async () => {
    expect(oldNonlinearityPct).toBeCloseTo(5, 12);
    const { loopRun, other } = await storedRuns();
    const otherBefore = fitFigures(other);
    expect((await CalibrationRun.findByPk(loopRun.id))!.nonlinearityPctFs).toBeCloseTo(5, 12);

    await migrateUp();
    const after = (await CalibrationRun.findByPk(loopRun.id))!;
    expect(after.nonlinearityPctFs).toBeCloseTo(0, 9);
    expect(after.gainNmPerV).toBeCloseTo(10, 12);
    expect(after.hysteresisPctFs).toBeCloseTo(((2 * loop(2)) / 40) * 100, 9);
    expect(fitFigures((await CalibrationRun.findByPk(other.id))!)).toEqual(otherBefore);
  });

  test('when up runs a second time, then every stored figure stays the same', async () => {
    const { loopRun, other } = await storedRuns();
    await recompute(loopRun.id, other.id);
    const once = [fitFigures((await CalibrationRun.findByPk(loopRun.id))!), fitFigures((await CalibrationRun.findByPk(other.id))!)];
    await recompute(loopRun.id, other.id);
    const twice = [fitFigures((await CalibrationRun.findByPk(loopRun.id))!), fitFigures((await CalibrationRun.findByPk(other.id))!)];
    expect(twice).toEqual(once);
    expect(once[0]!.nonlinearityPctFs).toBeCloseTo(0, 9);
  });

  test("when a run's points can no longer be fitted, then up leaves its figures as stored", async () => {
    const { loopRun } = await storedRuns();
    await loopRun.update({ pointsJson: '[]' });
    const before = fitFigures((await CalibrationRun.findByPk(loopRun.id))!);
    expect(await recompute(loopRun.id)).toEqual({ updated: 0, unfittable: 1 });
    expect(fitFigures((await CalibrationRun.findByPk(loopRun.id))!)).toEqual(before);
    expect(before.nonlinearityPctFs).toBeCloseTo(5, 12);
  });
});
