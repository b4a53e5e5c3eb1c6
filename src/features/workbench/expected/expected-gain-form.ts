import { z } from 'zod';
import { expectedGainInput } from '@shared/schemas/workbench.ts';
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
    tolerances: z.object({ lengthMm: maybe, thicknessMm: maybe, outerDiameterMm: maybe, wallMm: maybe }),
  })
  .superRefine((v, ctx) => {
    const needed = kindOf(v.spec.actuator).constant;
    if (v.materialKey === 'custom' && !v.custom[needed]) {
      ctx.addIssue({
        code: 'custom',
        path: ['custom', needed],
        message: `Enter ${constantLabels[needed]}: this actuator's formula uses it.`,
      });
    }
  })
  .transform((v): unknown => {
    const kind = kindOf(v.spec.actuator);
    const geometry = Object.fromEntries(kind.fields.map((f) => [f.name, v.spec[f.name]]).filter(([, x]) => x !== undefined));
    const tolerances = Object.fromEntries(
      kind.fields
        .filter((f) => f.unit === 'mm')
        .map((f) => [f.name, v.tolerances[f.name as keyof typeof v.tolerances]])
        .filter(([, x]) => x !== undefined),
    );
    return {
      actuator: kind.value,
      material: v.materialKey === 'custom' ? v.custom : v.materialKey,
      ...geometry,
      ...(v.measuredNmPerV === undefined ? {} : { measuredNmPerV: v.measuredNmPerV }),
      ...(Object.keys(tolerances).length > 0 ? { tolerances } : {}),
    };
  })
  .pipe(expectedGainInput);
