import { z } from 'zod';
import { expectedGainInput } from '@shared/schemas/workbench.ts';
import { expectedGain, measuredToExpectedRatio } from '@shared/workbench/expected-gain.ts';
import { materialKeys } from '@shared/workbench/materials.ts';
import { actuatorKinds, constantLabels, kindOf } from './actuator-kinds.ts';

const maybe = z.number().optional();

/**
 * Flat form values (every geometry field, a material key or custom constants, a measured gain) that
 * become the shared expected-gain input; the shared schema judges the fields the actuator needs,
 * and its issues land on the same `spec.*` field names.
 */
export const expectedGainForm = z
  .object({
    spec: z.object({
      actuator: z.enum(actuatorKinds.map((k) => k.value) as [string, ...string[]]),
      lengthMm: maybe,
      thicknessMm: maybe,
      outerDiameterMm: maybe,
      wallMm: maybe,
      layers: maybe,
      plates: maybe,
    }),
    materialKey: z.enum([...materialKeys, 'custom']),
    custom: z.object({ d31PmPerV: maybe, d33PmPerV: maybe, d15PmPerV: maybe }),
    measuredNmPerV: z.number().positive().optional(),
  })
  .superRefine((v, ctx) => {
    const needed = kindOf(v.spec.actuator).constant;
    if (v.materialKey === 'custom' && !v.custom[needed]) {
      ctx.addIssue({ code: 'custom', path: ['custom', needed], message: `Enter ${constantLabels[needed]}: this actuator's formula uses it.` });
    }
  })
  .transform((v): { spec: unknown; measuredNmPerV?: number } => {
    const kind = kindOf(v.spec.actuator);
    const geometry = Object.fromEntries(kind.fields.map((f) => [f.name, v.spec[f.name]]).filter(([, x]) => x !== undefined));
    return {
      spec: { actuator: kind.value, material: v.materialKey === 'custom' ? v.custom : v.materialKey, ...geometry },
      measuredNmPerV: v.measuredNmPerV,
    };
  })
  .pipe(z.object({ spec: expectedGainInput, measuredNmPerV: z.number().positive().optional() }));

/** Expected gain with its band, and measured ÷ expected when a measurement is given. */
export function computeExpectedGain(input: z.output<typeof expectedGainForm>) {
  const expected = expectedGain(input.spec);
  return {
    ...expected,
    comparison: input.measuredNmPerV === undefined ? null : measuredToExpectedRatio(input.measuredNmPerV, expected),
    basis: kindOf(input.spec.actuator).basis,
  };
}
