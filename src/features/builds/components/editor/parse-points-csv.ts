import { checkFitRow, rowsFromCsv } from '@/lib/csv/points-csv.ts';
import type { GridPoint } from './run-form-schema.ts';

/** A CSV row that was left out, by its line number in the text, and why. */
export interface BadRow {
  row: number;
  reason: string;
}

/** The run form's grid rows read from a CSV, the rows left out, and whether a header was found. */
export interface ParsedPointsCsv {
  points: GridPoint[];
  bad: BadRow[];
  hadHeader: boolean;
}

/**
 * Calibration points from pasted or uploaded CSV for the run form's grid, through the one points
 * reader the workbench uses too (comma, semicolon or tab; header optional; decimal commas; sweep
 * aliases). Rows that cannot be read are listed with their line number and reason.
 */
export function parsePointsCsv(text: string): ParsedPointsCsv {
  const { rows, hadHeader } = rowsFromCsv(text);
  const points: GridPoint[] = [];
  const bad: BadRow[] = [];
  for (const row of rows) {
    const checked = checkFitRow(row);
    if ('problem' in checked) bad.push({ row: row.line, reason: checked.problem.replace(/\.$/, '') });
    else points.push({ volts: row.volts.trim(), displacement: row.displacement.trim(), sweep: checked.point.sweep ?? '' });
  }
  return { points, bad, hadHeader };
}
