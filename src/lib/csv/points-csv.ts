// The one reader of calibration points from CSV text or a points grid (workbench and run form alike):
// columns volts, displacement, optional sweep, a header optional and in any order.
import type { FitPoint } from '@shared/schemas/workbench.ts';
import { looksLikeHeader, readNumber, splitCsv, type CsvLine, type RowProblem } from './split-csv.ts';

/** One row as typed or pasted, before checking. */
export interface RawFitRow {
  line: number;
  volts: string;
  displacement: string;
  sweep: string;
}

/** Good points with the line each came from, and the lines left out. */
export interface CheckedRows {
  points: FitPoint[];
  lines: number[];
  problems: RowProblem[];
  note: string | null;
}

/** Every spelling of a sweep direction people use in their files. */
export const SWEEP_ALIASES: Readonly<Record<string, FitPoint['sweep']>> = {
  '': undefined,
  none: undefined,
  up: 'up',
  u: 'up',
  '+': 'up',
  rising: 'up',
  down: 'down',
  d: 'down',
  dn: 'down',
  '-': 'down',
  falling: 'down',
};
const SWEEPS = SWEEP_ALIASES;

/** Checks one row: both numbers present and finite, sweep up, down or empty. */
export function checkFitRow(row: RawFitRow): { point: FitPoint } | { problem: string } {
  const v = readNumber(row.volts, 'volts');
  const x = readNumber(row.displacement, 'displacement');
  const wrong = [v, x].flatMap((r) => ('problem' in r ? [r.problem] : []));
  const sweepKey = row.sweep.trim().toLowerCase();
  if (!(sweepKey in SWEEPS)) wrong.push(`sweep “${row.sweep}” is not up or down (leave it empty for none)`);
  if (wrong.length > 0 || !('value' in v) || !('value' in x)) return { problem: `${wrong.join('; ')}.` };
  const sweep = SWEEPS[sweepKey];
  return { point: sweep ? { volts: v.value, displacement: x.value, sweep } : { volts: v.value, displacement: x.value } };
}

/** Checks every row; blank rows are skipped silently, bad ones listed. */
export function checkFitRows(rows: readonly RawFitRow[], note: string | null = null): CheckedRows {
  const out: CheckedRows = { points: [], lines: [], problems: [], note };
  for (const row of rows) {
    if (row.volts.trim() === '' && row.displacement.trim() === '' && row.sweep.trim() === '') continue;
    const checked = checkFitRow(row);
    if ('point' in checked) {
      out.points.push(checked.point);
      out.lines.push(row.line);
    } else out.problems.push({ line: row.line, message: checked.problem });
  }
  return out;
}

function columnsOf(header: CsvLine | undefined): { v: number; x: number; s: number; note: string | null } {
  if (!header) return { v: 0, x: 1, s: 2, note: null };
  const names = header.cells.map((c) =>
    c
      .toLowerCase()
      .replace(/\(.*?\)|\[.*?\]/g, '')
      .trim(),
  );
  const find = (re: RegExp) => names.findIndex((n) => re.test(n));
  const v = find(/^(v|volts?|voltage|drive|bias|u)\b/);
  const x = find(/^((x|z|d)\b|disp|pos|deflection|height|travel|reading)/);
  const s = find(/^(sweep|dir|direction)/);
  if (v < 0 || x < 0) return { v: 0, x: 1, s: 2, note: 'Header not recognised: reading columns 1–3 as volts, displacement, sweep.' };
  return { v, x, s, note: null };
}

/** Rows of a pasted or uploaded CSV: header optional (volts, displacement, sweep in any order). */
export function rowsFromCsv(text: string): { rows: RawFitRow[]; note: string | null; hadHeader: boolean } {
  const lines = splitCsv(text);
  const header = looksLikeHeader(lines[0]) ? lines[0] : undefined;
  const cols = columnsOf(header);
  const body = header ? lines.slice(1) : lines;
  return {
    rows: body.map(({ line, cells }) => ({
      line,
      volts: cells[cols.v] ?? '',
      displacement: cells[cols.x] ?? '',
      sweep: cols.s >= 0 ? (cells[cols.s] ?? '') : '',
    })),
    note: cols.note,
    hadHeader: header !== undefined,
  };
}
