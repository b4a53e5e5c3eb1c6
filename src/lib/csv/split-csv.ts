import Papa from 'papaparse';
import { parseNumber } from './number-text.ts';

/** One non-blank line of a CSV with its 1-based line number, for messages people can find. */
export interface CsvLine {
  line: number;
  cells: string[];
}

/** A line left out of a calculation, and why. */
export interface RowProblem {
  line: number;
  message: string;
}

/** Splits CSV text (comma, tab or semicolon; header optional) into lines, dropping blanks and # comments. */
export function splitCsv(text: string): CsvLine[] {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, delimitersToGuess: [',', '\t', ';', '|'] });
  const lines: CsvLine[] = [];
  parsed.data.forEach((row, i) => {
    const cells = row.map((c) => c.trim());
    if (cells.every((c) => c === '') || cells[0].startsWith('#')) return;
    lines.push({ line: i + 1, cells });
  });
  return lines;
}

/** A cell as a finite number, or what is wrong with it in words. */
export function readNumber(cell: string | undefined, name: string): { value: number } | { problem: string } {
  if (cell === undefined || cell === '') return { problem: `${name} is missing` };
  const value = parseNumber(cell);
  if (!Number.isFinite(value)) return { problem: `${name} “${cell.length > 20 ? `${cell.slice(0, 20)}…` : cell}” is not a number` };
  return { value };
}

/** True when the first line looks like column names rather than numbers. */
export function looksLikeHeader(line: CsvLine | undefined): boolean {
  return line !== undefined && line.cells.some((c) => c !== '' && !Number.isFinite(parseNumber(c)));
}

/**
 * Reads fixed numeric columns (in the given order; a header line is skipped). Bad lines are left
 * out with a message each; good ones come back as numbers with their line numbers.
 */
export function readNumericColumns(
  text: string,
  names: readonly string[],
): { rows: { line: number; values: number[] }[]; problems: RowProblem[] } {
  const lines = splitCsv(text);
  const body = looksLikeHeader(lines[0]) ? lines.slice(1) : lines;
  const rows: { line: number; values: number[] }[] = [];
  const problems: RowProblem[] = [];
  for (const { line, cells } of body) {
    const values: number[] = [];
    const wrong = names
      .map((name, i) => readNumber(cells[i], name))
      .flatMap((r) => ('value' in r ? (values.push(r.value), []) : [r.problem]));
    if (wrong.length > 0) problems.push({ line, message: `${wrong.join('; ')}.` });
    else rows.push({ line, values });
  }
  return { rows, problems };
}
