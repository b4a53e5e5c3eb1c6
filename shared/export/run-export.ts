// A run's raw record as a file: CSV (a few '#' comment lines naming the run, its source and licence,
// then a header row and one row per point or sample, numbers as recorded) or JSON.
import Papa from 'papaparse';
import type { RunDto } from '../schemas/run.ts';
import { displacementUnitLabels } from '../units.ts';
import { DATA_LICENCE } from '../data-licence.ts';
import { RUN_FIGURE_COLUMNS, runFigureRow } from './run-figures.ts';

/** Where a run comes from, for the file's header. */
export interface RunSource {
  buildId: number;
  buildTitle: string;
  partName: string;
  maker: string;
  url: string;
}

type Row = Array<string | number>;

/** Header and rows of a run's raw record in its own units. */
export function recordTable(run: RunDto, record: readonly unknown[]): { header: string[]; rows: Row[] } {
  const x = `displacement_${displacementUnitLabels[run.displacementUnit] === 'µm' ? 'um' : run.displacementUnit}`;
  const v = `volts_${run.voltageUnit}`;
  if (run.kind === 'sine-record') {
    const rows = (record as Array<{ timeS: number; volts: number; displacement: number }>).map((s) => [s.timeS, s.volts, s.displacement]);
    return { header: ['time_s', v, x], rows };
  }
  if (run.kind === 'lattice') {
    // The stored record is one object: the vectors of the whole image, then of each quarter found.
    type Vectors = { peaks?: { kx: number; ky: number }[]; quadrantPeaks?: { kx: number; ky: number }[][] };
    const l: Vectors = Array.isArray(record) ? {} : (record as unknown as Vectors);
    const rows: Row[] = [
      ...(l.peaks ?? []).map((k, i) => ['whole', i + 1, k.kx, k.ky]),
      ...(l.quadrantPeaks ?? []).flatMap((q, j) => q.map((k, i) => [`quarter ${j + 1}`, i + 1, k.kx, k.ky])),
    ];
    return { header: ['image_part', 'vector', 'kx_cycles_per_px', 'ky_cycles_per_px'], rows };
  }
  if (run.kind === 'peak-to-peak') {
    const r = run.reading;
    return {
      header: [`${x}_peak_to_peak`, `${v}_peak_to_peak`, `${x}_resolution`, `${v}_resolution`, 'frequency_hz'],
      rows: r ? [[r.displacementPp, r.voltsPp, r.displacementResolution, r.voltsResolution ?? '', r.frequencyHz ?? '']] : [],
    };
  }
  const rows = (record as Array<{ volts: number; displacement: number; sweep?: string }>).map((p) => [
    p.volts,
    p.displacement,
    p.sweep ?? '',
  ]);
  return { header: [v, x, 'sweep'], rows };
}

const clean = (s: string) => s.replace(/[\r\n]+/g, ' ');

/** The CSV export of one run. */
export function runCsv(run: RunDto, record: readonly unknown[], source: RunSource): string {
  const { header, rows } = recordTable(run, record);
  const figures = runFigureRow(run);
  const lines = [
    `# Scanwright calibration run ${run.id}: ${clean(source.partName)} in "${clean(source.buildTitle)}" by ${clean(source.maker)}`,
    `# ${source.url}`,
    `# Licence: ${DATA_LICENCE.name} (${DATA_LICENCE.id}), ${DATA_LICENCE.url}; credit "${DATA_LICENCE.attribution}, ${clean(source.maker)}" and link the run`,
    `# Figures (rounded as the run's page shows them): ${RUN_FIGURE_COLUMNS.map((c, i) => `${c}=${figures[i]}`).join('; ')}`,
  ];
  return `${lines.join('\n')}\n${Papa.unparse({ fields: header, data: rows }, { newline: '\n' })}\n`;
}

/** The JSON export of one run. */
export function runJson(run: RunDto, record: readonly unknown[], source: RunSource) {
  const { points: _plot, decimated: _d, ...rest } = run;
  const { header, rows } = recordTable(run, record);
  return {
    licence: DATA_LICENCE,
    source,
    run: rest,
    figures: Object.fromEntries(RUN_FIGURE_COLUMNS.map((c, i) => [c, runFigureRow(run)[i]])),
    columns: header,
    record: run.kind === 'peak-to-peak' ? rows : record,
  };
}
