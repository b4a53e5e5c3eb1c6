import { describe, expect, it } from 'vitest';
import { expectedGainForPart, expectedGainSpecForPart, type PartForExpectedGain } from '@shared/workbench/part-expected-gain.ts';

const tube: PartForExpectedGain = {
  category: 'tube',
  material: 'PZT-5H',
  lengthMm: 12.7,
  thicknessMm: null,
  outerDiameterMm: 6.35,
  wallMm: 0.508,
  layers: null,
};

describe('expected gain of a registry tube by axis and drive', () => {
  it('when a PZT-5H tube 12.7 × 6.35 × 0.508 mm is the Z axis, then the axial formula gives 6.85 nm/V [calc, FIELD check value]', () => {
    expect(expectedGainSpecForPart(tube, 'single', 'Z')?.actuator).toBe('tube-axial');
    const expected = expectedGainForPart(tube, 'single', 'Z');
    expect(expected?.gainNmPerV).toBeCloseTo(6.85, 2);
    expect(expected?.basis).toBe('tube-axial, PZT-5H');
  });

  it('when the tube is the XY axis on a quartered-tube drive, then opposite quadrants give 13.4 nm/V [S: C. J. Chen, APL 60, 132 (1992)]', () => {
    expect(expectedGainSpecForPart(tube, 'quartered-tube', 'XY')?.actuator).toBe('tube-opposite-pair');
    expect(expectedGainForPart(tube, 'quartered-tube', 'XY')?.gainNmPerV).toBeCloseTo(13.4, 1);
  });

  it('when one quadrant drives the X axis, then 6.70 nm/V [S: C. J. Chen, APL 60, 132 (1992)]', () => {
    expect(expectedGainSpecForPart(tube, 'single', 'X')?.actuator).toBe('tube-quadrant');
    expect(expectedGainForPart(tube, 'single', 'X')?.gainNmPerV).toBeCloseTo(6.7, 2);
  });

  it('when no axis is given (the part page), then a single drive is still one quadrant', () => {
    expect(expectedGainForPart(tube, 'single')?.gainNmPerV).toBeCloseTo(6.7, 2);
  });

  it('when a Z-axis tube is driven as a quartered tube, then the axis wins and the gain is axial', () => {
    expect(expectedGainSpecForPart(tube, 'quartered-tube', 'Z')?.actuator).toBe('tube-axial');
  });
});
