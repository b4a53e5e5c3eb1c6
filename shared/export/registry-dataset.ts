// The whole-registry dataset's files: parts with their pooled figures, accepted runs with their figures
// (RUN_FIGURE_COLUMNS, rounded as the run's page shows them) and every accepted run's raw record in long
// format, plus the README that explains them. Pure: the server feeds rows and streams the result.
import Papa from 'papaparse';
import type { PartStatsDto } from '../schemas/part.ts';
import type { PartCategory } from '../schemas/part-vocabulary.ts';
import type { RunDto } from '../schemas/run.ts';
import { formatShort, plainFigure } from '../format/measured-number.ts';
import { DATA_LICENCE } from '../data-licence.ts';
import { RUN_FIGURE_COLUMNS, runFigureRow } from './run-figures.ts';
import { recordTable } from './run-export.ts';

/** A listed part as the dataset needs it. */
export interface DatasetPart {
  id: number;
  name: string;
  category: PartCategory;
  salvageSource: string | null;
  material: string | null;
  lengthMm: number | null;
  widthMm: number | null;
  thicknessMm: number | null;
  outerDiameterMm: number | null;
  wallMm: number | null;
  layers: number | null;
  capacitanceNf: number | null;
  safeVolts: number | null;
  stats: PartStatsDto;
}

/** Where an accepted run belongs. */
export interface DatasetRunSource {
  partId: number;
  partName: string;
  buildId: number;
  buildTitle: string;
  maker: string;
}

/**
 * Text a spreadsheet could take for a formula (=, +, -, @, tab, CR first) gets a leading apostrophe
 * (OWASP's CSV injection advice [practice]). Only free text goes through this: numbers keep their minus sign.
 */
export function safeText(s: string | null | undefined): string {
  const t = (s ?? '').replace(/[\r\n]+/g, ' ');
  return /^[=+\-@\t\r]/.test(t) ? `'${t}` : t;
}

const plainNumber = (n: number | null) => (n === null || !Number.isFinite(n) ? '' : String(n));
const printed = (s: string) => plainFigure(s);

export const PART_COLUMNS = [
  'part_id',
  'name',
  'category',
  'salvage_source',
  'material',
  'length_mm',
  'width_mm',
  'thickness_mm',
  'outer_diameter_mm',
  'wall_mm',
  'layers',
  'capacitance_nf',
  'safe_volts_v',
  'accepted_runs',
  'builds',
  'gain_median_nm_per_v',
  'gain_p25_nm_per_v',
  'gain_p75_nm_per_v',
  'gain_min_nm_per_v',
  'gain_max_nm_per_v',
  'hysteresis_median_pct_of_span',
  'url',
] as const;

/** One part: its facts as entered, and its pooled figures rounded as the part page prints them (formatShort). */
export function partRow(p: DatasetPart, origin: string): string[] {
  const s = p.stats;
  return [
    String(p.id),
    safeText(p.name),
    p.category,
    safeText(p.salvageSource),
    safeText(p.material),
    plainNumber(p.lengthMm),
    plainNumber(p.widthMm),
    plainNumber(p.thicknessMm),
    plainNumber(p.outerDiameterMm),
    plainNumber(p.wallMm),
    plainNumber(p.layers),
    plainNumber(p.capacitanceNf),
    plainNumber(p.safeVolts),
    String(s.acceptedRunCount),
    String(s.buildCount),
    printed(formatShort(s.gainMedianNmPerV)),
    printed(formatShort(s.gainP25NmPerV)),
    printed(formatShort(s.gainP75NmPerV)),
    printed(formatShort(s.gainMinNmPerV)),
    printed(formatShort(s.gainMaxNmPerV)),
    printed(formatShort(s.hysteresisMedianPct, 2)),
    `${origin}/parts/${p.id}`,
  ];
}

export const RUN_COLUMNS = ['part_id', 'part_name', 'build_id', 'build_title', 'maker', ...RUN_FIGURE_COLUMNS, 'url'] as const;

/** One accepted run: where it belongs, then RUN_FIGURE_COLUMNS exactly as the run's export and page give them. */
export function runRow(run: RunDto, source: DatasetRunSource, origin: string): string[] {
  return [
    String(source.partId),
    safeText(source.partName),
    String(source.buildId),
    safeText(source.buildTitle),
    safeText(source.maker),
    ...runFigureRow(run),
    `${origin}/builds/${source.buildId}#run-${run.id}`,
  ];
}

/** The record columns a run of this kind and these units has (recordTable's header). */
export function recordColumns(run: Pick<RunDto, 'kind' | 'voltageUnit' | 'displacementUnit'>): string[] {
  return recordTable({ ...run, reading: null } as RunDto, []).header;
}

/**
 * points.csv's header: run_id, then the union of recordTable's columns over the kinds and units present
 * (each run fills its own and leaves the others empty), so one file holds every record in long format.
 */
export function pointsHeader(combos: ReadonlyArray<Pick<RunDto, 'kind' | 'voltageUnit' | 'displacementUnit'>>): string[] {
  const columns: string[] = [];
  for (const c of combos) for (const name of recordColumns(c)) if (!columns.includes(name)) columns.push(name);
  return ['run_id', ...columns];
}

/** A run's record as rows under `header` (from pointsHeader). */
export function pointsRows(run: RunDto, record: readonly unknown[], header: readonly string[]): Array<Array<string | number>> {
  const table = recordTable(run, record);
  const at = table.header.map((name) => header.indexOf(name));
  return table.rows.map((row) => {
    const out: Array<string | number> = header.map(() => '');
    out[0] = run.id;
    row.forEach((v, i) => {
      out[at[i]!] = v;
    });
    return out;
  });
}

/** CSV text of a header and rows (no formula escaping here: text cells are already safeText). */
export function csvText(fields: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | number>>, withHeader = true): string {
  if (rows.length === 0)
    return withHeader ? `${Papa.unparse({ fields: [...fields], data: [] }, { newline: '\n' }).replace(/\n+$/, '')}\n` : '';
  const body = Papa.unparse({ fields: [...fields], data: rows.map((r) => [...r]) }, { newline: '\n', header: withHeader });
  return `${body}\n`;
}

/** dataset.json: parts and runs with their figures (as printed, strings) keyed by column, and the licence. */
export function datasetJson(parts: string[][], runs: string[][], generatedAt: string, origin: string) {
  const keyed = (columns: readonly string[], rows: string[][]) => rows.map((r) => Object.fromEntries(columns.map((c, i) => [c, r[i]])));
  return {
    title: 'Scanwright registry dataset',
    source: origin,
    generatedAt,
    licence: DATA_LICENCE,
    credit: `${DATA_LICENCE.attribution} (${origin})`,
    note: 'Figures are strings rounded as the pages show them; raw points and samples are in points.csv.',
    parts: keyed(PART_COLUMNS, parts),
    runs: keyed(RUN_COLUMNS, runs),
  };
}

/** The README of the dataset: each file and column, units, the rounding rule, the licence and how to credit. */
export function datasetReadme(origin: string, generatedAt: string): string {
  const base = `${origin}/api/registry/dataset`;
  return `# Scanwright registry dataset

Calibration data for salvaged and home-made piezo (and other) actuators, contributed by makers to
Scanwright (${origin}). Generated ${generatedAt}; the files are rebuilt on request and may be cached
for five minutes.

## Licence and credit

${DATA_LICENCE.name} (${DATA_LICENCE.id}), ${DATA_LICENCE.url}.
Every contributor accepts this licence for the measurements they add. You may share and adapt the data
for any purpose if you give credit: "${DATA_LICENCE.attribution}, ${origin}", link the licence, and
say if you changed the data. Where you use single runs, naming the maker (the \`maker\` column) and
linking the run (\`url\`) is the courteous form.

## What is included

Only listed parts (accepted into the registry) and calibration runs that a moderator accepted, in builds
that are published. Drafts, pending and rejected runs, and unlisted parts are never included.

## Files

| file | what |
|---|---|
| [README.md](${base}/README.md) | this text |
| [parts.csv](${base}/parts.csv) | one row per listed part: its facts and figures pooled over its accepted runs |
| [runs.csv](${base}/runs.csv) | one row per accepted run: where it belongs and its fitted figures |
| [points.csv](${base}/points.csv) | every accepted run's raw points, samples or readings, one row each |
| [dataset.json](${base}/dataset.json) | parts and runs as in the two CSV files (no raw points), with this licence |

CSV files: UTF-8, comma-separated, a header row, "." as decimal mark, no digit grouping, empty cell =
no value. Text a spreadsheet could read as a formula starts with an apostrophe.

## Rounding

Figures are rounded exactly as the pages show them (one formatter): a value with an uncertainty is
rounded to the place of its uncertainty, and the uncertainty to two significant figures (GUM, JCGM
100:2008, 7.2.6); R² to 4 decimal places; nonlinearity and hysteresis to 0.1 % of span; pooled part
figures to 3 significant figures (hysteresis 2). Powers of ten are written as 1.2e-5. For more digits,
refit the raw points in points.csv.

## parts.csv

| column | meaning |
|---|---|
| part_id | registry id (${origin}/parts/<id>) |
| name, category, salvage_source, material | as listed |
| length_mm, width_mm, thickness_mm, outer_diameter_mm, wall_mm | geometry in millimetres, as entered |
| layers | layers of a stack |
| capacitance_nf | capacitance in nanofarads |
| safe_volts_v | the voltage the part is stated to take, volts |
| accepted_runs, builds | how many accepted runs (in how many builds) the figures pool |
| gain_median_nm_per_v | median of the accepted runs' gain magnitudes, nm/V |
| gain_p25_nm_per_v, gain_p75_nm_per_v | quartiles (Hyndman–Fan type 7) of the same, nm/V |
| gain_min_nm_per_v, gain_max_nm_per_v | lowest and highest gain magnitude, nm/V |
| hysteresis_median_pct_of_span | median hysteresis of runs that have one, % of span |
| url | the part's page |

The pooled figures count every accepted run of the part; runs.csv lists those whose build is published.

## runs.csv

| column | meaning |
|---|---|
| part_id, part_name | the registry part the actuator uses |
| build_id, build_title, maker | the build and its maker (their Scanwright handle) |
| run_id | run id |
| kind | points (a calibration curve), peak-to-peak (two readings under a sine), sine-record (a sampled record, IEEE Std 1057 sine fit) or lattice (a lattice in a scan image) |
| method | how displacement was measured: indicator, capacitive, interferometer, optical-lever, reference-sample |
| status | accepted |
| measured_on | the day of the measurement, if given (YYYY-MM-DD) |
| points | points, readings or samples recorded |
| gain_nm_per_v | fitted gain, nm/V (sign = direction of motion) |
| gain_plus_minus_nm_per_v | its ± |
| plus_minus_is | what that ± is: a 95 % interval half-width (point runs) or a standard uncertainty (k = 1) |
| gain_worst_case_low_nm_per_v, gain_worst_case_high_nm_per_v | worst-case bounds from the reading resolutions (peak-to-peak runs) |
| r2 | coefficient of determination of the line (point runs) |
| residual_sd_nm | standard deviation of the residuals, nm |
| nonlinearity_pct_of_span | independent nonlinearity, % of span |
| hysteresis_pct_of_span | widest gap between up and down sweeps, % of span |
| span_nm | displacement span, nm |
| sine_frequency_hz, phase_lag_deg | fitted drive frequency and the displacement's phase lag (sine records) |
| voltage_unit, displacement_unit | the units the raw record in points.csv is in |
| url | the run on its build page |

## points.csv

Long format: one row per point, sample or reading; \`run_id\` joins it to runs.csv. Numbers are as the
maker recorded them, in the run's own units, named in each column: \`volts_V\` or \`volts_mV\`;
\`displacement_nm\`, \`displacement_um\` (micrometres), \`displacement_angstrom\`, \`displacement_uin\`
(microinches) or \`displacement_mil\`. A run fills only its own columns:

- points runs: volts, displacement, \`sweep\` (up, down or empty);
- sine-record runs: \`time_s\` (seconds), volts, displacement;
- peak-to-peak runs: one row with the \`…_peak_to_peak\` readings, their \`…_resolution\` and \`frequency_hz\`;
- lattice runs (gain: the actuator's axis, or the mean of x and y on an XY actuator): one row per measured reciprocal vector, \`kx_cycles_per_px\` and \`ky_cycles_per_px\`, of the whole
  image and of each quarter (\`image_part\`, \`vector\`); the lattice, image size and drive spans are in the run's JSON.

## dataset.json

\`{ title, source, generatedAt, licence, credit, note, parts: [...], runs: [...] }\`: each part and run is an
object keyed by the CSV columns above, values as strings exactly as in the CSV files.
`;
}
