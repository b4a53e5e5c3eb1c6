import Papa from 'papaparse';
import { parseNumber } from './parse-number.ts';
import type { GridPoint } from './run-form-schema.ts';

/** A CSV row that was left out, by its line number in the text, and why. */
export interface BadRow {
  row: number;
  reason: string;
}

export interface ParsedPointsCsv {
  points: GridPoint[];
  bad: BadRow[];
  hadHeader: boolean;
}

interface Columns {
  volts: number;
  displacement: number;
  sweep: number | null;
}

const SWEEPS: Record<string, GridPoint['sweep']> = {
  up: 'up',
  u: 'up',
  '+': 'up',
  rising: 'up',
  down: 'down',
  d: 'down',
  '-': 'down',
  falling: 'down',
  '': '',
  none: '',
};

/** Where volts, displacement and sweep are, from a header row; falls back to that order. */
function columnsFrom(header: string[] | null): Columns {
  if (!header) return { volts: 0, displacement: 1, sweep: 2 };
  const names = header.map((h) =>
    h
      .toLowerCase()
      .replace(/\(.*?\)|\[.*?\]/g, '')
      .trim(),
  );
  const find = (re: RegExp) => names.findIndex((n) => re.test(n));
  const volts = find(/volt|^v$|^u$|drive|bias/);
  const displacement = find(/disp|defl|pos|height|^x$|^z$|^d$|travel|nm|um|µm/);
  const sweep = find(/sweep|dir/);
  return {
    volts: volts >= 0 ? volts : 0,
    displacement: displacement >= 0 ? displacement : 1,
    sweep: sweep >= 0 ? sweep : header.length > 2 ? 2 : null,
  };
}

/**
 * Calibration points from pasted or uploaded CSV (comma, semicolon or tab): volts, displacement and
 * an optional sweep (up/down). A header row is optional. Rows that cannot be read are listed with
 * their line number and reason and left out; blank lines are skipped.
 */
export function parsePointsCsv(text: string): ParsedPointsCsv {
  const result = Papa.parse<string[]>(text.replace(/^\uFEFF/, '').trim(), { skipEmptyLines: false });
  const rows = result.data.map((r) => r.map((c) => String(c ?? '').trim()));
  const firstIndex = rows.findIndex((r) => r.some((c) => c !== ''));
  const first = rows[firstIndex];
  const hadHeader = Boolean(first && !Number.isFinite(parseNumber(first[0] ?? '')));
  const cols = columnsFrom(hadHeader ? first : null);
  const points: GridPoint[] = [];
  const bad: BadRow[] = [];

  rows.forEach((cells, index) => {
    const row = index + 1;
    if ((hadHeader && index === firstIndex) || cells.every((c) => c === '')) return;
    const voltsText = cells[cols.volts] ?? '';
    const dispText = cells[cols.displacement] ?? '';
    const sweepText = cols.sweep === null ? '' : (cells[cols.sweep] ?? '').toLowerCase();
    const problems: string[] = [];
    if (!voltsText) problems.push('volts is missing');
    else if (!Number.isFinite(parseNumber(voltsText))) problems.push(`volts "${voltsText}" is not a number`);
    if (!dispText) problems.push('displacement is missing');
    else if (!Number.isFinite(parseNumber(dispText))) problems.push(`displacement "${dispText}" is not a number`);
    if (!Object.hasOwn(SWEEPS, sweepText)) problems.push(`sweep "${sweepText}" should be up, down or empty`);
    if (problems.length > 0) return void bad.push({ row, reason: problems.join('; ') });
    points.push({ volts: voltsText, displacement: dispText, sweep: SWEEPS[sweepText] });
  });
  return { points, bad, hadHeader };
}
