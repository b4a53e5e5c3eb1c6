import { describe, expect, test } from 'vitest';
import { expectedGainForPart } from '../../shared/workbench/part-expected-gain.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';
import { DEMO_BUILDS } from '../../server/db/seed/demo-builds.ts';

// The demo's cartridge bar is our own invented scenario: its geometry predicts a gain away from round
// figures near 100 nm/V, and the invented runs on it scatter around that prediction with a visible loop.
const bar = DEMO_PARTS.find((p) => p.key === 'cartridge-bar')!;
const runs = DEMO_BUILDS.flatMap((b) => b.actuators.filter((a) => a.part === 'cartridge-bar').flatMap((a) => a.runs));
const predicted = expectedGainForPart(
  { ...bar, lengthMm: bar.lengthMm ?? null, thicknessMm: bar.thicknessMm ?? null, outerDiameterMm: null, wallMm: null, layers: null },
  'single',
)!;

describe('demo seed: the cartridge bar', () => {
  test('when its geometry goes through the series-bimorph formula, then it predicts about 70 nm/V, not about 100 [calc]', () => {
    expect(predicted.gainNmPerV).toBeGreaterThan(65);
    expect(predicted.gainNmPerV).toBeLessThan(75);
  });

  test('when its runs are read, then every invented gain lies within 8 % of the prediction and none is a whole number', () => {
    expect(runs.length).toBeGreaterThanOrEqual(4);
    for (const r of runs) {
      expect(Math.abs(r.gainNmPerV / predicted.gainNmPerV - 1)).toBeLessThan(0.08);
      expect(Number.isInteger(r.gainNmPerV)).toBe(false);
    }
    expect(new Set(runs.map((r) => r.gainNmPerV)).size).toBe(runs.length);
  });

  test('when its runs are read, then each has a hysteresis loop of 5–15 % of span, as salvaged PZT shows in open loop [practice]', () => {
    for (const r of runs) {
      expect(r.loopFraction).toBeGreaterThanOrEqual(0.05);
      expect(r.loopFraction).toBeLessThanOrEqual(0.15);
    }
  });

  test('when its name is read, then it carries the geometry the prediction uses', () => {
    expect(bar.name).toContain(`${bar.lengthMm} × ${bar.widthMm} × ${bar.thicknessMm} mm`);
  });
});
