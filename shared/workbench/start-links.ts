// Workbench pages started from a registry part or from one of my actuators: the page's URL search (the same
// `key=value` params a page writes as people type, see src/features/workbench/form/url-inputs.ts), built from
// the part's stored geometry and material, an actuator's measured gain or its saved drive matrix.
// tests/unit/start-links.test.ts reads every link back with the pages' own form schemas.
import { isMaterialKey, materials } from './materials.ts';
import { expectedGainForPart, expectedGainSpecForPart } from './part-expected-gain.ts';
import type { DriveMatrixDto } from '../schemas/drive-matrix.ts';

/** Workbench pages a part or an actuator can start. */
export type StartTool = 'expected-gain' | 'tube' | 'resonance' | 'loaded-gain' | 'mixing';

/** The pages' titles as the workbench index names them (src/features/workbench/tools.ts). */
export const startToolTitles: Readonly<Record<StartTool, string>> = {
  'expected-gain': 'Expected gain',
  tube: 'Piezo tube',
  resonance: 'Cantilever resonance',
  'loaded-gain': 'Loaded gain',
  mixing: 'Two-axis mixer',
};

/** What a start link needs of a part (a registry part's stored fields, mm). */
export interface PartForStart {
  category: string;
  material: string | null;
  geometry: {
    lengthMm: number | null;
    widthMm: number | null;
    thicknessMm: number | null;
    outerDiameterMm: number | null;
    wallMm: number | null;
    layers: number | null;
  };
}

/** What a start link needs of an actuator: its part, how it is driven, its newest gain and any saved drive matrix. */
export interface ActuatorForStart {
  part: PartForStart;
  axis: string;
  drive: string;
  measuredGainNmPerV: number | null;
  driveMatrix: DriveMatrixDto | null;
}

type Params = Record<string, string | number | null | undefined>;

const known = (v: number | null | undefined): v is number => v !== null && v !== undefined && Number.isFinite(v) && v > 0;

/** `?a=1&b=x` from params, leaving out empty ones; `,` and `;` stay readable (legal in a query). */
export function queryText(pairs: ReadonlyArray<readonly [string, string]>): string {
  const enc = (s: string) => encodeURIComponent(s).replace(/%2C/gi, ',').replace(/%3B/gi, ';').replace(/%20/g, '+');
  return pairs.map(([k, v]) => `${enc(k)}=${enc(v)}`).join('&');
}

function search(params: Params): string {
  const pairs = Object.entries(params)
    .filter((e): e is [string, string | number] => e[1] !== null && e[1] !== undefined && e[1] !== '')
    .map(([k, v]) => [k, String(v)] as const);
  return pairs.length > 0 ? `?${queryText(pairs)}` : '';
}

const materialOf = (part: PartForStart) => (part.material && isMaterialKey(part.material) ? part.material : null);
const round = (v: number) => Number(v.toPrecision(6));

/** The pages a part's stored fields can start: expected gain always; a tube its tube page; a bender its resonance and spring pages. */
export function startToolsForPart(part: PartForStart): StartTool[] {
  const tools: StartTool[] = ['expected-gain'];
  if (part.category === 'tube') tools.push('tube');
  if (part.category === 'bimorph') tools.push('resonance', 'loaded-gain');
  return tools;
}

/** The pages an actuator can start: its part's, plus the mixer where a drive matrix is saved on an XY pair. */
export function startToolsForActuator(a: ActuatorForStart): StartTool[] {
  const tools = startToolsForPart(a.part);
  if (a.axis === 'XY' && a.driveMatrix) tools.push('mixing');
  return tools;
}

function partParams(tool: StartTool, part: PartForStart, drive = 'single', axis?: string): Params {
  const g = part.geometry;
  const material = materialOf(part);
  switch (tool) {
    case 'expected-gain': {
      const spec = expectedGainSpecForPart({ ...g, category: part.category, material: part.material }, drive, axis);
      const kind =
        spec?.actuator ??
        ({ bimorph: 'bimorph-series', stack: 'stack', 'shear-plate': 'shear-plate', tube: 'tube-quadrant' } as Record<string, string>)[
          part.category
        ];
      return {
        actuator: kind,
        'spec.lengthMm': g.lengthMm,
        'spec.thicknessMm': g.thicknessMm,
        'spec.outerDiameterMm': g.outerDiameterMm,
        'spec.wallMm': g.wallMm,
        layers: g.layers,
        materialKey: material,
      };
    }
    case 'tube':
      return {
        lengthMm: g.lengthMm,
        outerDiameterMm: g.outerDiameterMm,
        wallMm: g.wallMm,
        ...(material
          ? {
              preset: material,
              relPermittivity: materials[material].relPermittivity33T,
              youngsModulusGpa: materials[material].youngsModulusGpa,
              densityKgPerM3: materials[material].densityKgPerM3,
            }
          : {}),
      };
    case 'resonance':
      return {
        dimensionUnit: 'mm',
        length: g.lengthMm,
        thickness: g.thicknessMm,
        width: g.widthMm,
        ...(material
          ? { preset: material, youngsModulusGpa: materials[material].youngsModulusGpa, densityKgPerM3: materials[material].densityKgPerM3 }
          : {}),
      };
    case 'loaded-gain': {
      const expected = expectedGainForPart({ ...g, category: part.category, material: part.material }, drive, axis);
      return {
        freeGainNmPerV: expected ? round(expected.gainNmPerV) : undefined,
        stiffnessSource: 'bender',
        benderLengthMm: g.lengthMm,
        benderWidthMm: g.widthMm,
        benderThicknessMm: g.thicknessMm,
        benderModulusGpa: material ? materials[material].youngsModulusGpa : undefined,
      };
    }
    case 'mixing':
      return {};
  }
}

const withPositive = (params: Params): Params =>
  Object.fromEntries(Object.entries(params).filter(([, v]) => typeof v !== 'number' || known(v) || v === 0));

/** The search that starts `tool` from a registry part's geometry and material (fields the part lacks keep the page's defaults). */
export function partStartSearch(tool: StartTool, part: PartForStart): string {
  return search(withPositive(partParams(tool, part)));
}

/**
 * The search that starts `tool` from one of my actuators: its part as above, its newest gain as the
 * measured gain (expected-gain page), and on the mixer its saved G, offsets, model and drive limits.
 */
export function actuatorStartSearch(tool: StartTool, a: ActuatorForStart): string {
  if (tool === 'mixing') {
    const m = a.driveMatrix;
    if (!m) return '';
    return search({
      gain: m.gainNmPerV.map((r) => r.join(',')).join(';'),
      offsetXNm: m.offsetNm[0],
      offsetYNm: m.offsetNm[1],
      model: m.model,
      vaMinV: m.limits.vaMinV,
      vaMaxV: m.limits.vaMaxV,
      vbMinV: m.limits.vbMinV,
      vbMaxV: m.limits.vbMaxV,
    });
  }
  const params = withPositive(partParams(tool, a.part, a.drive, a.axis));
  if (tool === 'expected-gain' && a.measuredGainNmPerV !== null && known(Math.abs(a.measuredGainNmPerV)))
    params.measuredNmPerV = round(Math.abs(a.measuredGainNmPerV));
  return search(params);
}
