// Small-signal constants of common PZT families. Names are families, not grades: real parts vary,
// so every expected gain is shown with a ±20 % band (FIELD.md "Materials").
// Table [S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E]; the PZT-4 and
// PZT-8 rows are [memory]. Sign: d31 < 0 for PZT; gain formulas use |d31|.

/** Keys of the built-in materials, in the order the picker shows them. */
export const materialKeys = ['PZT-5A', 'PZT-5H', 'PZT-4', 'PZT-8'] as const;

/** One of the built-in materials. */
export type MaterialKey = (typeof materialKeys)[number];

/** Constants of one piezoceramic family, with where the row comes from. */
export interface PiezoMaterial {
  key: MaterialKey;
  d31PmPerV: number;
  d33PmPerV: number;
  d15PmPerV: number;
  s11EM2PerN: number;
  youngsModulusGpa: number;
  relPermittivity33T: number;
  densityKgPerM3: number;
  source: string;
}

const ERTURK_INMAN = '[S: Erturk & Inman, Piezoelectric Energy Harvesting, Wiley 2011, App. E]';
const MEMORY = '[memory]';

/** The built-in table; `source` carries the FIELD.md tag of the row. */
export const materials: Readonly<Record<MaterialKey, PiezoMaterial>> = {
  'PZT-5A': {
    key: 'PZT-5A',
    d31PmPerV: -171,
    d33PmPerV: 374,
    d15PmPerV: 584,
    s11EM2PerN: 16.4e-12,
    youngsModulusGpa: 61.0,
    relPermittivity33T: 1700,
    densityKgPerM3: 7750,
    source: ERTURK_INMAN,
  },
  'PZT-5H': {
    key: 'PZT-5H',
    d31PmPerV: -274,
    d33PmPerV: 593,
    d15PmPerV: 741,
    s11EM2PerN: 16.5e-12,
    youngsModulusGpa: 60.6,
    relPermittivity33T: 3400,
    densityKgPerM3: 7500,
    source: ERTURK_INMAN,
  },
  'PZT-4': {
    key: 'PZT-4',
    d31PmPerV: -123,
    d33PmPerV: 289,
    d15PmPerV: 496,
    s11EM2PerN: 12.3e-12,
    youngsModulusGpa: 81.3,
    relPermittivity33T: 1300,
    densityKgPerM3: 7500,
    source: MEMORY,
  },
  'PZT-8': {
    key: 'PZT-8',
    d31PmPerV: -97,
    d33PmPerV: 225,
    d15PmPerV: 330,
    s11EM2PerN: 11.5e-12,
    youngsModulusGpa: 87.0,
    relPermittivity33T: 1000,
    densityKgPerM3: 7600,
    source: MEMORY,
  },
};

/** Half-width of the band shown around every expected gain: families vary by about ±20 %. */
export const MATERIAL_BAND_FRACTION = 0.2;

/** Type guard so forms and routes can accept either a key or custom constants. */
export function isMaterialKey(value: unknown): value is MaterialKey {
  return typeof value === 'string' && (materialKeys as readonly string[]).includes(value);
}
