import { z } from 'zod';
import { resonanceInput } from '@shared/schemas/workbench.ts';
import { materialKeys, materials } from '@shared/workbench/materials.ts';
import { sourceInWords } from '@shared/workbench/source-words.ts';

/** Material presets: the built-in PZT families and a silicon lever (FIELD notes: E 169 GPa, ρ 2329 kg/m³ [memory]). */
export const resonancePresets = [
  ...materialKeys.map((k) => ({
    value: k,
    label: k,
    source: sourceInWords(materials[k].source),
    eGpa: materials[k].youngsModulusGpa,
    rho: materials[k].densityKgPerM3,
  })),
  { value: 'silicon', label: 'Silicon (lever)', source: sourceInWords('[memory]'), eGpa: 169, rho: 2329 },
  { value: 'custom', label: 'Custom', source: 'your own values', eGpa: undefined, rho: undefined },
] as const;

const metresPer = { mm: 1e-3, um: 1e-6 } as const;
const s = resonanceInput.shape;

/** Dimensions in mm or µm, E in GPa and tip mass in mg, converted to the shared schema's SI units. */
export const resonanceForm = z
  .object({
    preset: z.string(),
    dimensionUnit: z.enum(['mm', 'um']),
    length: s.lengthM,
    thickness: s.thicknessM,
    width: s.widthM,
    youngsModulusGpa: s.youngsModulusPa,
    densityKgPerM3: s.densityKgPerM3,
    tipMassMg: s.tipMassKg,
  })
  .transform((v): z.input<typeof resonanceInput> => {
    const m = metresPer[v.dimensionUnit];
    return {
      lengthM: v.length * m,
      thicknessM: v.thickness * m,
      widthM: v.width === undefined ? undefined : v.width * m,
      youngsModulusPa: v.youngsModulusGpa * 1e9,
      densityKgPerM3: v.densityKgPerM3,
      tipMassKg: v.tipMassMg === undefined ? undefined : v.tipMassMg * 1e-6,
    };
  })
  .pipe(resonanceInput);
