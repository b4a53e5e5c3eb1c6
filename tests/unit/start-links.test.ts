// Workbench links started from a registry part or an actuator, read back with the pages' own form schemas:
// the link's params are the same ones the pages write. Check values: FIELD.md geometry and materials.
import { describe, expect, test } from 'vitest';
import {
  actuatorStartSearch,
  partStartSearch,
  startToolsForActuator,
  startToolsForPart,
  type PartForStart,
} from '../../shared/workbench/start-links.ts';
import { decodeInputs } from '../../src/features/workbench/form/url-inputs.ts';
import { expectedGainForm } from '../../src/features/workbench/expected/expected-gain-form.ts';
import { tubeForm } from '../../src/features/workbench/expected/tube-form.ts';
import { loadedGainForm } from '../../src/features/workbench/expected/loaded-gain-form.ts';
import { resonanceForm } from '../../src/features/workbench/simple/resonance-form.ts';
import { mixingForm } from '../../src/features/workbench/mixing/mixing-form.ts';
import { expectedGainCalculator } from '../../shared/workbench/calculators/expected-gain-calculator.ts';

const read = <T>(schema: Parameters<typeof decodeInputs>[0], search: string, defaults: T) =>
  decodeInputs(schema, new URLSearchParams(search.replace(/^\?/, '')), defaults);

const geometry = { lengthMm: null, widthMm: null, thicknessMm: null, outerDiameterMm: null, wallMm: null, layers: null };
// FIELD.md check bar: L 12 mm, h 0.6 mm PZT-5A series bimorph → 102.6 nm/V [S: Smits, Dalke & Cooney 1991; calc]
const bender: PartForStart = {
  category: 'bimorph',
  material: 'PZT-5A',
  geometry: { ...geometry, lengthMm: 12, widthMm: 2, thicknessMm: 0.6 },
};
// FIELD.md check tube: L 12.7, OD 6.35, wall 0.508 mm, PZT-5H [S: Chen 1992; calc]
const tube: PartForStart = {
  category: 'tube',
  material: 'PZT-5H',
  geometry: { ...geometry, lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508 },
};

const egDefaults = {
  spec: { actuator: 'plate-thickness', lengthMm: 1, thicknessMm: 1, outerDiameterMm: 1, wallMm: 1, layers: 1, plates: 1 },
  materialKey: 'PZT-8',
  custom: {},
  tolerances: {},
};

describe('partStartSearch', () => {
  test('when a bender part starts the expected-gain page, then its geometry and material fill the form and it computes 102.6 nm/V [calc]', () => {
    const values = read(expectedGainForm, partStartSearch('expected-gain', bender), egDefaults);
    expect(values).toMatchObject({ spec: { actuator: 'bimorph-series', lengthMm: 12, thicknessMm: 0.6 }, materialKey: 'PZT-5A' });
    const parsed = expectedGainForm.parse(values);
    expect(expectedGainCalculator.compute(parsed).gainNmPerV).toBeCloseTo(102.6, 1);
  });

  test('when a tube part starts the tube page, then the geometry and the PZT-5H constants fill it [S: Erturk & Inman 2011, App. E]', () => {
    const values = read(tubeForm, partStartSearch('tube', tube), {
      preset: 'custom',
      lengthMm: 1,
      outerDiameterMm: 1,
      wallMm: 0.1,
      relPermittivity: 1,
      youngsModulusGpa: 1,
      densityKgPerM3: 1,
    });
    expect(values).toEqual({
      preset: 'PZT-5H',
      lengthMm: 12.7,
      outerDiameterMm: 6.35,
      wallMm: 0.508,
      relPermittivity: 3400,
      youngsModulusGpa: 60.6,
      densityKgPerM3: 7500,
    });
  });

  test('when a bender starts the resonance and spring pages, then lengths, width, modulus and the expected free gain fill them [calc]', () => {
    const res = read(resonanceForm, partStartSearch('resonance', bender), {
      preset: 'custom',
      dimensionUnit: 'um',
      length: 1,
      thickness: 1,
      youngsModulusGpa: 1,
      densityKgPerM3: 1,
    });
    expect(res).toMatchObject({
      preset: 'PZT-5A',
      dimensionUnit: 'mm',
      length: 12,
      thickness: 0.6,
      width: 2,
      youngsModulusGpa: 61,
      densityKgPerM3: 7750,
    });
    const loaded = read(loadedGainForm, partStartSearch('loaded-gain', bender), {
      freeGainNmPerV: 1,
      stiffnessSource: 'entered',
      springRateNPerM: 1,
      preloadForceN: 1,
    });
    expect(loaded).toMatchObject({
      stiffnessSource: 'bender',
      benderLengthMm: 12,
      benderWidthMm: 2,
      benderThicknessMm: 0.6,
      benderModulusGpa: 61,
    });
    expect(loaded.freeGainNmPerV).toBeCloseTo(102.6, 1);
  });

  test('when a part lacks geometry or a known material, then those params are left out and the page keeps its values', () => {
    const bare: PartForStart = { category: 'bimorph', material: 'salvaged ceramic', geometry: { ...geometry, lengthMm: 20 } };
    const values = read(expectedGainForm, partStartSearch('expected-gain', bare), egDefaults);
    expect(values).toMatchObject({ spec: { actuator: 'bimorph-series', lengthMm: 20, thicknessMm: 1 }, materialKey: 'PZT-8' });
  });

  test('pages a part can start follow its category', () => {
    expect(startToolsForPart(bender)).toEqual(['expected-gain', 'resonance', 'loaded-gain']);
    expect(startToolsForPart(tube)).toEqual(['expected-gain', 'tube']);
  });
});

describe('actuatorStartSearch', () => {
  test('when an actuator with runs starts the expected-gain page, then its newest gain is the measured gain (magnitude)', () => {
    const search = actuatorStartSearch('expected-gain', {
      part: bender,
      axis: 'X',
      drive: 'single',
      measuredGainNmPerV: -88.25,
      driveMatrix: null,
    });
    expect(read(expectedGainForm, search, egDefaults as Record<string, unknown>).measuredNmPerV).toBe(88.25);
  });

  test('when an XY pair has a saved matrix, then the mixer link carries G, offsets, model and limits', () => {
    const driveMatrix = {
      gainNmPerV: [
        [70.7107, -70.7107],
        [70.7107, 70.7107],
      ] as [[number, number], [number, number]],
      offsetNm: [12.5, -3] as [number, number],
      limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -100, vbMaxV: 120 },
      model: 'affine' as const,
      measuredOn: null,
      savedAt: '2026-12-01T00:00:00.000Z',
    };
    const a = { part: bender, axis: 'XY', drive: 'pair-anti-phase', measuredGainNmPerV: null, driveMatrix };
    expect(startToolsForActuator(a)).toContain('mixing');
    const search = actuatorStartSearch('mixing', a);
    expect(search).toContain('gain=70.7107,-70.7107;70.7107,70.7107');
    const mixDefaults = {
      gain: [
        [1, 0],
        [0, 1],
      ],
      limits: { vaMinV: -1, vaMaxV: 1, vbMinV: -1, vbMaxV: 1 },
      targetXNm: 1,
      targetYNm: 1,
    };
    expect(read(mixingForm, search, mixDefaults)).toEqual({
      gain: driveMatrix.gainNmPerV,
      limits: driveMatrix.limits,
      offsetXNm: 12.5,
      offsetYNm: -3,
      model: 'affine',
      targetXNm: 1,
      targetYNm: 1,
    });
  });
});
