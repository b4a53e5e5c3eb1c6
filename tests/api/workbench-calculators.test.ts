import { describe, expect, test } from 'vitest';
import request from 'supertest';
import { workbenchClient } from '../support/workbench-client.ts';
import { calculators } from '../../shared/workbench/calculators/all-calculators.ts';

const client = workbenchClient();

const { post } = client;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const errorShape = { error: { code: expect.any(String), message: expect.any(String) } };
const cautionIds = (body: { cautions: { id: string }[] }) => body.cautions.map((c) => c.id);

const slugs = calculators.map((c) => c.slug);

describe('POST /api/workbench/<slug> without a session or CSRF token', () => {
  test.each(slugs)('when a visitor with no cookie posts an empty body to %s, then 400 validation_failed, not 403', async (slug) => {
    const res = await request(client.app()).post(`/api/workbench/${slug}`).send({});
    expect(res.body.error?.code).not.toBe('csrf_failed');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/fit', () => {
  test('when a straight run is posted in µm, then 200 and the gain in nm/V [calc]', async () => {
    const points = [0, 1, 2, 3].map((v) => ({ volts: v, displacement: 0.1026 * v }));
    const res = await post('fit', { points, displacementUnit: 'um' });
    expect(res.status).toBe(200);
    expect(res.body.gainNmPerV).toBeCloseTo(102.6, 9);
  });
});

describe('POST /api/workbench/peak-to-peak', () => {
  test('when 2 µm p-p at 20 V p-p is read to 10 nm, then 100 nm/V, u = g·(10/√6)/2000 and bounds [99.5, 100.5] [calc]', async () => {
    const res = await post('peak-to-peak', { displacementPpNm: 2000, voltsPpV: 20, displacementResolutionNm: 10 });
    expect(res.status).toBe(200);
    expect(res.body.gainNmPerV).toBeCloseTo(100, 12);
    expect(res.body.gainStdUncNmPerV).toBeCloseTo((100 * 10) / Math.sqrt(6) / 2000, 12);
    expect(res.body.gainBoundsNmPerV[0]).toBeCloseTo(99.5, 12);
    expect(res.body.gainBoundsNmPerV[1]).toBeCloseTo(100.5, 12);
  });

  test.each([
    ['a string value', { displacementPpNm: '2000', voltsPpV: 20, displacementResolutionNm: 10 }],
    ['a zero swing', { displacementPpNm: 2000, voltsPpV: 0, displacementResolutionNm: 10 }],
    [
      'a voltage resolution as large as the swing',
      { displacementPpNm: 2000, voltsPpV: 2, displacementResolutionNm: 10, voltsResolutionV: 2 },
    ],
  ])('when the body has %s, then 400', async (_name, body) => {
    const res = await post('peak-to-peak', body);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape);
  });
});

describe('POST /api/workbench/creep', () => {
  test('when the record follows γ = 0.02, then γ comes back and +6 % at 100 s [S: PI catalogue 1998–2006; calc]', async () => {
    const samples = [0.1, 1, 10, 100].map((timeS) => ({ timeS, displacementNm: 1000 * (1 + 0.02 * Math.log10(timeS / 0.1)) }));
    const res = await post('creep', { samples });
    expect(res.status).toBe(200);
    expect(res.body.gamma).toBeCloseTo(0.02, 12);
    expect(res.body.displacementAt0p1sNm).toBeCloseTo(1000, 9);
    expect(res.body.creepAt100sPct).toBeCloseTo(6, 9);
  });

  test('when every sample is at the same time, then 400 invalid_input', async () => {
    const res = await post('creep', { samples: [1, 2, 3].map((d) => ({ timeS: 1, displacementNm: d })) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
  });

  test('when a time is negative, then 400 validation_failed', async () => {
    const res = await post('creep', { samples: [-1, 2, 3].map((timeS) => ({ timeS, displacementNm: 1 })) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/expected-gain', () => {
  test.each([
    [
      'series bimorph 12 × 0.6 mm PZT-5A → 102.6 nm/V [calc; S: Smits, Dalke & Cooney 1991]',
      { actuator: 'bimorph-series', material: 'PZT-5A', lengthMm: 12, thicknessMm: 0.6 },
      102.6,
    ],
    [
      'parallel bimorph, same bar → 205.2 nm/V [calc; S: Smits, Dalke & Cooney 1991]',
      { actuator: 'bimorph-parallel', material: 'PZT-5A', lengthMm: 12, thicknessMm: 0.6 },
      205.2,
    ],
    [
      '200-layer PZT-5H stack → 118.6 nm/V [calc; S: Murata piezo actuator basics]',
      { actuator: 'stack', material: 'PZT-5H', layers: 200 },
      118.6,
    ],
    ['PZT-5A shear plate → 0.584 nm/V [calc]', { actuator: 'shear-plate', material: 'PZT-5A' }, 0.584],
    ['1 mm PZT-5A plate, thickness mode → 0.374 nm/V [calc]', { actuator: 'plate-thickness', material: 'PZT-5A' }, 0.374],
    [
      'tube axial 12.7 × 6.35 × 0.508 mm PZT-5H → 6.85 nm/V [calc]',
      { actuator: 'tube-axial', material: 'PZT-5H', lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508 },
      6.85,
    ],
  ])('when %s', async (_name, body, expected) => {
    const res = await post('expected-gain', body);
    expect(res.status).toBe(200);
    expect(rel(res.body.gainNmPerV, expected)).toBeLessThan(5e-3);
    expect(res.body.lowNmPerV).toBeCloseTo(res.body.gainNmPerV * 0.8, 9);
    expect(res.body.highNmPerV).toBeCloseTo(res.body.gainNmPerV * 1.2, 9);
  });

  test('when a quartered PZT-5H tube is driven on one quadrant and on an opposite pair, then 6.70 and 13.4 nm/V [calc; S: Chen, APL 60, 132 (1992); FIELD check values]', async () => {
    const tube = { material: 'PZT-5H', lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508 };
    const one = await post('expected-gain', { actuator: 'tube-quadrant', ...tube });
    const pair = await post('expected-gain', { actuator: 'tube-opposite-pair', ...tube });
    expect(one.status).toBe(200);
    expect(one.body.gainNmPerV).toBeCloseTo(6.7, 2);
    expect(pair.body.gainNmPerV).toBeCloseTo(13.4, 1);
    expect(one.body.basis).toMatch(/√2·d31/);
    expect(one.body.materialSource).toBe('[S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E]');
  });

  test('when custom constants lack the d31 a bender needs, then 400 invalid_input', async () => {
    const res = await post('expected-gain', { actuator: 'bimorph-series', material: { d33PmPerV: 400 }, lengthMm: 12, thicknessMm: 0.6 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
  });

  test.each([
    ['an unknown actuator', { actuator: 'voice-coil', material: 'PZT-5A' }],
    ['an unknown material', { actuator: 'shear-plate', material: 'PZT-9' }],
    ['a length as a string', { actuator: 'bimorph-series', material: 'PZT-5A', lengthMm: '12', thicknessMm: 0.6 }],
    ['a missing thickness', { actuator: 'bimorph-series', material: 'PZT-5A', lengthMm: 12 }],
    ['a wall thicker than the radius', { actuator: 'tube-quadrant', material: 'PZT-5H', lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 4 }],
  ])('when the body has %s, then 400', async (_name, body) => {
    const res = await post('expected-gain', body);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape);
  });
});

describe('POST /api/workbench/mixing', () => {
  const g = 100 / Math.SQRT2;
  const pair = [
    [g, -g],
    [g, g],
  ];

  test('when an equal-gain ±45° pair is asked for x = y = 707.1 nm, then Va = 10 V, Vb = 0 V, reachable [practice; calc]', async () => {
    const res = await post('mixing', {
      gain: pair,
      limits: { vaMinV: -15, vaMaxV: 15, vbMinV: -15, vbMaxV: 15 },
      target: { xNm: 1000 / Math.SQRT2, yNm: 1000 / Math.SQRT2 },
    });
    expect(res.status).toBe(200);
    expect(res.body.target.vaV).toBeCloseTo(10, 9);
    expect(res.body.target.vbV).toBeCloseTo(0, 9);
    expect(res.body.target.reachable).toBe(true);
    expect(res.body.sinAngle).toBeCloseTo(1, 12);
    expect(res.body.regionNm).toHaveLength(4);
    expect(res.body.regionNm[1].xNm).toBeCloseTo(g * 15 - g * -15, 9);
    expect(res.body.cautions).toEqual([]);
  });

  test('when the limits reach ±150 V and the point is outside, then unreachable with the high-voltage cautions [calc]', async () => {
    const res = await post('mixing', {
      gain: pair,
      limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -150, vbMaxV: 150 },
      target: { xNm: 0, yNm: 30000 },
    });
    expect(res.status).toBe(200);
    expect(res.body.target.reachable).toBe(false);
    expect(cautionIds(res.body)).toEqual(expect.arrayContaining(['amplifier', 'discharge', 'local-codes']));
  });

  test('when G is singular (parallel actuators), then 400 invalid_input', async () => {
    const res = await post('mixing', {
      gain: [
        [1, 2],
        [2, 4],
      ],
      limits: { vaMinV: 0, vaMaxV: 10, vbMinV: 0, vbMaxV: 10 },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
  });

  test.each([
    ['a minimum above its maximum', { gain: pair, limits: { vaMinV: 10, vaMaxV: 0, vbMinV: 0, vbMaxV: 10 } }],
    [
      'a 3-column row',
      {
        gain: [
          [1, 0, 0],
          [0, 1],
        ],
        limits: { vaMinV: 0, vaMaxV: 10, vbMinV: 0, vbMaxV: 10 },
      },
    ],
    [
      'a gain as a string',
      {
        gain: [
          ['1', 0],
          [0, 1],
        ],
        limits: { vaMinV: 0, vaMaxV: 10, vbMinV: 0, vbMaxV: 10 },
      },
    ],
  ])('when the body has %s, then 400 validation_failed', async (_name, body) => {
    const res = await post('mixing', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/mixing-fit', () => {
  test('when a 3 × 3 grid is driven through a known G, then that G comes back [calc]', async () => {
    const gain = [
      [70, -72],
      [71, 69],
    ];
    const samples = [-10, 0, 10].flatMap((vaV) =>
      [-10, 0, 10].map((vbV) => ({
        vaV,
        vbV,
        xNm: gain[0][0] * vaV + gain[0][1] * vbV,
        yNm: gain[1][0] * vaV + gain[1][1] * vbV,
      })),
    );
    const res = await post('mixing-fit', { samples });
    expect(res.status).toBe(200);
    expect(res.body.n).toBe(9);
    res.body.gainNmPerV.flat().forEach((v: number, i: number) => expect(v).toBeCloseTo(gain.flat()[i], 9));
    expect(res.body.residualStdXNm).toBeLessThan(1e-9);
  });

  test('when Va and Vb always move together, then 400 degenerate_grid naming the problem', async () => {
    const samples = [1, 2, 3, 4].map((v) => ({ vaV: v, vbV: v, xNm: v, yNm: v }));
    const res = await post('mixing-fit', { samples });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('degenerate_grid');
    expect(res.body.error.message).toMatch(/change together/);
  });

  test('when the indicator zero is offset by 250 nm, then the affine fit returns offsetNm and the true G; through the origin on request [calc]', async () => {
    const gain = [
      [70, -72],
      [71, 69],
    ];
    const samples = [0, 5, 10].flatMap((vaV) =>
      [0, 5, 10].map((vbV) => ({
        vaV,
        vbV,
        xNm: 250 + gain[0][0] * vaV + gain[0][1] * vbV,
        yNm: -30 + gain[1][0] * vaV + gain[1][1] * vbV,
      })),
    );
    const res = await post('mixing-fit', { samples });
    expect(res.status).toBe(200);
    expect(res.body.model).toBe('affine');
    expect(res.body.offsetNm[0]).toBeCloseTo(250, 8);
    expect(res.body.offsetNm[1]).toBeCloseTo(-30, 8);
    res.body.gainNmPerV.flat().forEach((v: number, i: number) => expect(v).toBeCloseTo(gain.flat()[i], 9));
    const origin = await post('mixing-fit', { samples, model: 'origin' });
    expect(origin.status).toBe(200);
    expect(origin.body.offsetNm).toEqual([0, 0]);
  });

  test('when the voltages underflow double precision, then 400 numeric_underflow, not a degenerate-grid message', async () => {
    const samples = [
      [0, 0],
      [1, 0],
      [0, 1],
      [1, 1],
    ].map(([a, b]) => ({ vaV: a * 1e-200, vbV: b * 1e-200, xNm: a + b, yNm: a - b }));
    const res = await post('mixing-fit', { samples });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('numeric_underflow');
  });

  test('when fewer than 3 samples are sent, then 400 validation_failed', async () => {
    const res = await post('mixing-fit', { samples: [{ vaV: 1, vbV: 0, xNm: 1, yNm: 0 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/scan-plan', () => {
  const chain = { dacBits: 16, dacSpanV: 10, ampGainVPerV: 30, actuatorGainNmPerV: 102.6, pixelsPerLine: 256, lines: 256, lineRateHz: 1 };

  test('when 102.6 nm/V is driven over 300 V at 16 bit, then the step is 0.47 nm, with the high-voltage cautions [calc]', async () => {
    const res = await post('scan-plan', { ...chain, resonanceHz: 1890, wantedStepNm: 0.1 });
    expect(res.status).toBe(200);
    expect(res.body.outputSpanV).toBe(300);
    expect(res.body.lsbNm).toBeCloseTo(0.47, 2);
    expect(res.body.rangeNm).toBeCloseTo(30780, 6);
    expect(res.body.frameTimeS).toBe(256);
    expect(res.body.lineRateCeilingSineLikeHz).toBeCloseTo(189, 9);
    expect(res.body.lineRateCeilingTriangleHz).toBeCloseTo(18.9, 9);
    expect(res.body.bitsNeeded).toBe(19);
    expect(cautionIds(res.body)).toContain('amplifier');
  });

  test('when the line rate is a tenth of the resonance, then the gain error is +1 % [calc]', async () => {
    const res = await post('scan-plan', { ...chain, ampGainVPerV: 1, lineRateHz: 100, resonanceHz: 1000 });
    expect(res.status).toBe(200);
    expect(res.body.gainErrorAtLineRatePct).toBeCloseTo(1.0101, 4);
    expect(res.body.cautions).toEqual([]);
  });

  test.each([
    ['0 DAC bits', { ...chain, dacBits: 0 }],
    ['fractional DAC bits', { ...chain, dacBits: 15.5 }],
    ['a negative amplifier gain', { ...chain, ampGainVPerV: -2 }],
    ['an extra field', { ...chain, colour: 'copper' }],
  ])('when the body has %s, then 400 validation_failed', async (_name, body) => {
    const res = await post('scan-plan', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/resonance', () => {
  test('when a PZT-5A bar is 12 × 0.6 mm, then 1.89 kHz [calc; S: Rao, Timoshenko]', async () => {
    const res = await post('resonance', { lengthM: 12e-3, thicknessM: 0.6e-3, youngsModulusPa: 61e9, densityKgPerM3: 7750 });
    expect(res.status).toBe(200);
    expect(res.body.firstModeHz / 1000).toBeCloseTo(1.89, 2);
    expect(res.body.springConstantNPerM).toBeNull();
  });

  test('when a silicon lever is 125 × 30 × 4 µm, then 352 kHz and k = 41.5 N/m [calc; E, ρ memory]', async () => {
    const lever = { lengthM: 125e-6, thicknessM: 4e-6, widthM: 30e-6, youngsModulusPa: 169e9, densityKgPerM3: 2329 };
    const res = await post('resonance', lever);
    expect(res.status).toBe(200);
    expect(res.body.firstModeHz / 1000).toBeCloseTo(352, 0);
    expect(res.body.springConstantNPerM).toBeCloseTo(41.5, 1);
  });

  test('when the tip mass equals the effective mass 0.2427·m, then the frequency drops by √2 [calc]', async () => {
    const lever = { lengthM: 125e-6, thicknessM: 4e-6, widthM: 30e-6, youngsModulusPa: 169e9, densityKgPerM3: 2329 };
    const beamMassKg = 2329 * 125e-6 * 30e-6 * 4e-6;
    const res = await post('resonance', { ...lever, tipMassKg: (3 / 1.875104068711961 ** 4) * beamMassKg });
    expect(res.status).toBe(200);
    expect(res.body.withTipMassHz).toBeCloseTo(res.body.firstModeHz / Math.SQRT2, 6);
  });

  test('when a tip mass is given, then the line-rate ceilings follow the loaded mode [S: Bae & Granick 2000; practice]', async () => {
    const bar = { lengthM: 12e-3, thicknessM: 0.6e-3, widthM: 2e-3, youngsModulusPa: 61e9, densityKgPerM3: 7750, tipMassKg: 100e-6 };
    const res = await post('resonance', bar);
    expect(res.status).toBe(200);
    expect(res.body.withTipMassHz).toBeLessThan(res.body.firstModeHz / 2);
    expect(res.body.lineRateCeilingSineLikeHz).toBeCloseTo(res.body.withTipMassHz / 10, 9);
    expect(res.body.lineRateCeilingTriangleHz).toBeCloseTo(res.body.withTipMassHz / 100, 9);
  });

  test('when a tip mass comes without a width, then 400 invalid_input', async () => {
    const res = await post('resonance', {
      lengthM: 0.012,
      thicknessM: 0.0006,
      youngsModulusPa: 61e9,
      densityKgPerM3: 7750,
      tipMassKg: 1e-6,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
  });

  test('when the length is zero, then 400 validation_failed', async () => {
    const res = await post('resonance', { lengthM: 0, thicknessM: 0.0006, youngsModulusPa: 61e9, densityKgPerM3: 7750 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/drive-current', () => {
  test('when 3.4 nF is driven at 100 V, 1 kHz, then 2.1 mA peak and the high-voltage cautions [calc]', async () => {
    const res = await post('drive-current', { capacitanceF: 3.4e-9, amplitudeV: 100, frequencyHz: 1000 });
    expect(res.status).toBe(200);
    expect(res.body.peakCurrentA * 1000).toBeCloseTo(2.1, 1);
    expect(res.body.rmsCurrentA).toBeCloseTo(res.body.peakCurrentA / Math.SQRT2, 15);
    expect(res.body).toMatchObject({ highVoltage: true, storedCharge: false });
    expect(cautionIds(res.body)).toContain('local-codes');
  });

  test('when 1 µF holds 150 V, then 150 µC and 11 mJ, flagged as stored charge [calc]', async () => {
    const res = await post('drive-current', { capacitanceF: 1e-6, amplitudeV: 150, frequencyHz: 0 });
    expect(res.status).toBe(200);
    expect(res.body.storedChargeC).toBeCloseTo(150e-6, 12);
    expect(res.body.storedEnergyJ * 1000).toBeCloseTo(11.25, 9);
    expect(res.body.storedCharge).toBe(true);
    expect(res.body.peakCurrentA).toBe(0);
  });

  test.each([
    ['a zero capacitance', { capacitanceF: 0, amplitudeV: 10, frequencyHz: 10 }],
    ['a negative frequency', { capacitanceF: 1e-9, amplitudeV: 10, frequencyHz: -1 }],
    ['a missing amplitude', { capacitanceF: 1e-9, frequencyHz: 10 }],
  ])('when the body has %s, then 400 validation_failed', async (_name, body) => {
    const res = await post('drive-current', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('POST /api/workbench/tunnelling', () => {
  test('when φ = 4 eV, then κ = 1.025 Å⁻¹ and ×7.8 per Å [calc; memory: 1-D WKB, CODATA 2018]', async () => {
    const res = await post('tunnelling', { workFunctionEv: 4 });
    expect(res.status).toBe(200);
    expect(res.body.decayConstantPerAngstrom).toBeCloseTo(1.025, 3);
    expect(res.body.currentRatioPerAngstrom).toBeCloseTo(7.8, 1);
    expect(res.body.gapChangePerDecadeAngstrom).toBeCloseTo(Math.LN10 / (2 * res.body.decayConstantPerAngstrom), 12);
  });

  test.each([
    ['zero', 0],
    ['above 20 eV', 25],
    ['a string', '4'],
  ])('when φ is %s, then 400', async (_name, workFunctionEv) => {
    const res = await post('tunnelling', { workFunctionEv });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject(errorShape);
  });
});

describe('POST /api/workbench/convert', () => {
  test('when 1 µin and 1 mil are converted, then 25.4 nm and 25.4 µm exactly [S: NBS Circular 572 addendum, 1960; calc]', async () => {
    const uin = await post('convert', { value: 1, from: 'uin', to: 'nm' });
    const mil = await post('convert', { value: 1, from: 'mil', to: 'um' });
    expect(uin.status).toBe(200);
    expect(uin.body).toMatchObject({ converted: 25.4, valueNm: 25.4, to: 'nm' });
    expect(mil.body.converted).toBe(25.4);
  });

  test('when 1 µin/V is converted to nm/V, then 25.4 nm/V, and gains do not convert into lengths [S: NBS Circular 572 addendum, 1960; calc]', async () => {
    const res = await post('convert', { value: 1, from: 'uin/V', to: 'nm/V' });
    expect(res.status).toBe(200);
    expect(res.body.converted).toBe(25.4);
    const bad = await post('convert', { value: 1, from: 'uin/V', to: 'nm' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('validation_failed');
  });

  test('when 10 Å are converted to nm, then 1 nm [S: 1 Å = 0.1 nm]', async () => {
    const res = await post('convert', { value: 10, from: 'angstrom', to: 'nm' });
    expect(res.body.converted).toBe(1);
  });

  test.each([
    ['an unknown unit', { value: 1, from: 'furlong', to: 'nm' }],
    ['a string value', { value: '1', from: 'nm', to: 'um' }],
  ])('when the body has %s, then 400 validation_failed', async (_name, body) => {
    const res = await post('convert', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

// One composition: every calculator's route answers exactly what the shared function (the page's
// live preview) returns for the same input. A calculator added without an example here fails.
const examples: Record<string, unknown> = {
  fit: {
    points: [0, 2, 4, 6, 8, 10, 8, 6, 4, 2, 0].map((v, i) => ({
      volts: v * 8,
      displacement: 0.1 * v * 8 + (i > 5 ? 0.05 : 0) + 0.01 * Math.sin(i),
      sweep: i <= 5 ? 'up' : 'down',
    })),
    displacementUnit: 'um',
  },
  'peak-to-peak': { displacementPpNm: 15, voltsPpV: 60, displacementResolutionNm: 10, voltsResolutionV: 0.5 },
  creep: {
    samples: [0.1, 1, 10, 100].map((t) => ({ timeS: t, displacementNm: 1000 * (1 - 0.3 * Math.log10(t / 0.1)) })),
    projectToS: 3600,
  },
  'expected-gain': {
    actuator: 'tube-opposite-pair',
    material: 'PZT-5H',
    lengthMm: 12.7,
    outerDiameterMm: 6.35,
    wallMm: 0.508,
    measuredNmPerV: 11,
    tolerances: { lengthMm: 0.1, wallMm: 0.02 },
  },
  mixing: {
    gain: [
      [70.7, -70.7],
      [70.7, 70.7],
    ],
    limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -150, vbMaxV: 150 },
    target: { xNm: 500, yNm: 1200 },
  },
  'mixing-fit': {
    samples: [0, 5, 10].flatMap((a) =>
      [0, 5, 10].map((b) => ({ vaV: a, vbV: b, xNm: 3 + 70 * a - 69 * b + 0.1 * Math.cos(a + b), yNm: -2 + 71 * a + 70 * b })),
    ),
  },
  'scan-plan': {
    dacBits: 16,
    dacSpanV: 10,
    ampGainVPerV: 30,
    actuatorGainNmPerV: 102.6,
    pixelsPerLine: 256,
    lines: 256,
    lineRateHz: 50,
    scanSizeNm: 50000,
    resonanceHz: 1890,
    wantedStepNm: 0.1,
  },
  resonance: { lengthM: 5e-3, thicknessM: 0.6e-3, widthM: 2e-3, youngsModulusPa: 61e9, densityKgPerM3: 7750, tipMassKg: 20e-6 },
  'drive-current': { capacitanceF: 1e-6, amplitudeV: 150, frequencyHz: 100 },
  tunnelling: { workFunctionEv: 4, wantedRatio: 10 },
  convert: { value: 3, from: 'angstrom/V', to: 'uin/V' },
  'loaded-gain': { freeGainNmPerV: 102.6, actuatorStiffnessNPerM: 300, springRateNPerM: 150, preloadForceN: 0.5 },
  tube: { lengthMm: 12.7, outerDiameterMm: 6.35, wallMm: 0.508, relPermittivity: 3400, youngsModulusPa: 60.6e9, densityKgPerM3: 7500 },
  'drive-limits': {
    capacitanceF: 3.4e-9,
    amplitudeV: 100,
    frequencyHz: 1000,
    currentLimitA: 0.001,
    rasterSwingPpV: 60,
    lineRateHz: 5,
    outputResistanceOhm: 10000,
  },
  'noise-floor': {
    actuatorGainNmPerV: 102.6,
    ampGainVPerV: 30,
    noiseDensityVPerRtHz: 20e-9,
    bandwidthHz: 1000,
    dacBits: 16,
    dacSpanV: 10,
    cantileverStiffnessNPerM: 0.1,
    temperatureK: 295,
  },
  'sine-fit': {
    samples: Array.from({ length: 400 }, (_, i) => ({
      timeS: i / 100,
      volts: 5 + 30 * Math.sin(2 * Math.PI * 1.3 * (i / 100)) + 0.2 * Math.cos(7 * i),
      displacement: 0.2 + 2.4 * Math.sin(2 * Math.PI * 1.3 * (i / 100) - 0.3) + 0.01 * Math.sin(11 * i),
    })),
    displacementUnit: 'um',
  },
  // A loop with a cubic bend on each branch [calc, invented]: up 0→100 V, down 100→0 V.
  linearise: {
    points: [
      ...[0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100].map((v) => ({
        volts: v,
        displacement: 80 * v + 0.004 * v ** 3 - 0.4 * v ** 2,
        sweep: 'up',
      })),
      ...[100, 90, 80, 70, 60, 50, 40, 30, 20, 10, 0].map((v) => ({
        volts: v,
        displacement: 80 * v + 0.3 * v * (100 - v) - 0.4 * v ** 2 + 0.004 * v ** 3,
        sweep: 'down',
      })),
    ],
    displacementUnit: 'nm',
    degree: 'auto',
  },
  // A square lattice of 8 px period, 64 × 64, turned 10° [calc, invented]; 0.5 nm constant, 20 V spans.
  lattice: {
    heights: Array.from({ length: 64 }, (_, r) =>
      Array.from(
        { length: 64 },
        (_, c) =>
          Math.cos((2 * Math.PI * (c * Math.cos(0.1745) + r * Math.sin(0.1745))) / 8) +
          Math.cos((2 * Math.PI * (-c * Math.sin(0.1745) + r * Math.cos(0.1745))) / 8),
      ),
    ),
    lattice: { kind: 'square', constantNm: 0.5 },
    scanSpanV: { x: 20, y: 20 },
  },
};

describe('POST /api/workbench/<slug> answers what the page shows', () => {
  test.each(calculators.map((c) => [c.slug, c] as const))(
    'when %s gets its example, then the body equals the shared calculator on the same parsed input',
    async (slug, c) => {
      expect(examples[slug], `no example input for ${slug}`).toBeDefined();
      const res = await post(slug, examples[slug]);
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const parsed: unknown = (c.input as unknown as { parse: (v: unknown) => unknown }).parse(examples[slug]);
      expect(res.body).toEqual(JSON.parse(JSON.stringify((c.compute as (i: unknown) => unknown)(parsed))));
      expect(Array.isArray(res.body.warnings)).toBe(true);
      expect(Array.isArray(res.body.cautions)).toBe(true);
    },
  );
});
