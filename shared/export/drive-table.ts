// A linearisation table as files: CSV for a spreadsheet or a host script, and a C array for a
// microcontroller that drives the scanner through it (volts per target position, per sweep branch).
import type { TableRow } from '../workbench/linearise.ts';

const COLUMNS: Array<[keyof TableRow, string]> = [
  ['targetNm', 'target_nm'],
  ['volts', 'volts'],
  ['voltsUp', 'volts_up'],
  ['voltsDown', 'volts_down'],
];

const present = (rows: readonly TableRow[]) => COLUMNS.filter(([k]) => rows.some((r) => r[k] !== undefined));
const plain = (v: number) => Number(v.toPrecision(7)).toString();
/** A C float literal needs a point or an exponent before its f suffix ("0f" does not compile; "0.0f" does). */
const cFloat = (v: number) => {
  const s = plain(v);
  return `${/[.e]/.test(s) ? s : `${s}.0`}f`;
};

/** The table as CSV with a header row: target_nm, then volts (one branch) or volts_up and volts_down. */
export function driveTableCsv(rows: readonly TableRow[]): string {
  const cols = present(rows);
  return [cols.map(([, name]) => name).join(','), ...rows.map((r) => cols.map(([k]) => plain(r[k] as number)).join(','))].join('\n') + '\n';
}

/** The table as C arrays (float, 7 significant figures), one per column, with its length. */
export function driveTableC(rows: readonly TableRow[], name = 'scanwright_drive'): string {
  const cols = present(rows);
  const lines = [
    `/* Drive table from Scanwright: for each target position (nm), the volts to apply on each sweep branch.`,
    ` * Interpolate linearly between rows; stay inside the table's range. */`,
    `#define ${name.toUpperCase()}_ROWS ${rows.length}`,
  ];
  for (const [k, col] of cols)
    lines.push(`static const float ${name}_${col}[${rows.length}] = {`, `  ${rows.map((r) => cFloat(r[k] as number)).join(', ')}`, '};');
  return `${lines.join('\n')}\n`;
}
