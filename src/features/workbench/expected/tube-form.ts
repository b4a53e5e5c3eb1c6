import { z } from 'zod';
import { tubeInput } from '@shared/schemas/workbench-extras.ts';
import { materialKeys, materials } from '@shared/workbench/materials.ts';
import { sourceInWords } from '@shared/workbench/source-words.ts';

/** Material presets: εr (ε33T/ε0), E and ρ of the built-in PZT families, or your own values. */
export const tubePresets = [
  ...materialKeys.map((k) => ({
    value: k,
    label: k,
    source: sourceInWords(materials[k].source),
    relPermittivity: materials[k].relPermittivity33T as number | undefined,
    eGpa: materials[k].youngsModulusGpa as number | undefined,
    rho: materials[k].densityKgPerM3 as number | undefined,
  })),
  { value: 'custom', label: 'Custom', source: 'your own values', relPermittivity: undefined, eGpa: undefined, rho: undefined },
];

const s = tubeInput.shape;

/** The tube in mm and E in GPa, converted to the shared schema (mm, Pa). */
export const tubeForm = z
  .object({
    preset: z.string(),
    lengthMm: s.lengthMm,
    outerDiameterMm: s.outerDiameterMm,
    wallMm: s.wallMm,
    relPermittivity: s.relPermittivity,
    youngsModulusGpa: s.youngsModulusPa,
    densityKgPerM3: s.densityKgPerM3,
  })
  .transform((v): z.input<typeof tubeInput> => ({
    lengthMm: v.lengthMm,
    outerDiameterMm: v.outerDiameterMm,
    wallMm: v.wallMm,
    relPermittivity: v.relPermittivity,
    youngsModulusPa: v.youngsModulusGpa * 1e9,
    densityKgPerM3: v.densityKgPerM3,
  }))
  .pipe(tubeInput);
