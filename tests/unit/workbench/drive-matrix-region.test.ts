import { describe, expect, test } from 'vitest';
import { equalGainPairMatrix, reachableRegion, reachableRegionWithOffset } from '../../../shared/workbench/mixing.ts';
import { driveMatrixInput } from '../../../shared/schemas/drive-matrix.ts';

describe('reachableRegionWithOffset', () => {
  test('when offsets are zero, then it is the plain reachable region [calc]', () => {
    const g = equalGainPairMatrix(100);
    const limits = { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 };
    expect(reachableRegionWithOffset(g, limits, [0, 0])).toEqual(reachableRegion(g, limits));
  });

  test('when the fit has offsets, then every corner moves by x₀, y₀: x = x₀ + G·V [practice; calc]', () => {
    // Equal gains 100 nm/V at ±45°: (Va, Vb) = (10, −10) gives x = 100·20/√2 = 1414.2 nm, y = 0 [calc, FIELD.md]
    const corners = reachableRegionWithOffset(equalGainPairMatrix(100), { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 }, [50, -20]);
    expect(corners[1].xNm).toBeCloseTo(50 + 2000 / Math.SQRT2, 9);
    expect(corners[1].yNm).toBeCloseTo(-20, 9);
  });
});

describe('driveMatrixInput', () => {
  const ok = {
    gainNmPerV: [
      [70, -70],
      [70, 70],
    ],
    limits: { vaMinV: -10, vaMaxV: 10, vbMinV: -10, vbMaxV: 10 },
  };
  test('when offsets and model are left out, then they default to zero and "affine" [practice]', () => {
    expect(driveMatrixInput.parse(ok)).toMatchObject({ offsetNm: [0, 0], model: 'affine' });
  });
  test('when G has no inverse or the model through the origin has offsets, then it is refused on that field [practice]', () => {
    const singular = driveMatrixInput.safeParse({
      ...ok,
      gainNmPerV: [
        [1, 2],
        [2, 4],
      ],
    });
    expect(singular.success ? [] : singular.error.issues.map((i) => i.path.join('.'))).toEqual(['gainNmPerV']);
    const origin = driveMatrixInput.safeParse({ ...ok, model: 'origin', offsetNm: [1, 0] });
    expect(origin.success ? [] : origin.error.issues.map((i) => i.path.join('.'))).toEqual(['offsetNm']);
  });
});
