// A scope or data-acquisition export read as a table (the app's one CSV splitter, src/lib/csv), the
// columns people map to time, drive and displacement, and the samples those columns give.
import type { SineSample } from '@shared/schemas/sine-fit.ts';
import { looksLikeHeader, readNumber, splitCsv, type CsvLine, type RowProblem } from '@/lib/csv/split-csv.ts';

/** The table as read: column names (from a header line or numbered), and the data lines. */
export interface SineTable {
  names: string[];
  hadHeader: boolean;
  lines: CsvLine[];
}

/** Which column (0-based) holds each channel. */
export interface ColumnMapping {
  time: number;
  volts: number;
  displacement: number;
}

/** Time units a record's time column may be in, with seconds per unit. */
export const timeUnits = { s: 1, ms: 1e-3, us: 1e-6 } as const;

/** One of the time units. */
export type TimeUnit = keyof typeof timeUnits;

/** Splits the text; a first line with words is taken as the header. */
export function readSineTable(text: string): SineTable {
  const lines = splitCsv(text);
  const hadHeader = looksLikeHeader(lines[0]);
  const body = hadHeader ? lines.slice(1) : lines;
  const width = Math.max(hadHeader ? lines[0].cells.length : 0, ...body.slice(0, 50).map((l) => l.cells.length), 0);
  const names = Array.from({ length: width }, (_, i) => (hadHeader && lines[0].cells[i] ? lines[0].cells[i] : `Column ${i + 1}`));
  return { names, hadHeader, lines: body };
}

const clean = (name: string) =>
  name
    .toLowerCase()
    .replace(/\(.*?\)|\[.*?\]/g, '')
    .trim();

/** A first guess of the mapping from column names (time, drive, displacement), else columns 1–3 in that order. */
export function guessMapping(table: SineTable): ColumnMapping {
  const names = table.names.map(clean);
  const find = (re: RegExp, taken: number[]) => names.findIndex((n, i) => !taken.includes(i) && re.test(n));
  const time = find(/^(t|time|sec|seconds?|s)\b/, []);
  const volts = find(/^(v|volts?|voltage|drive|ch ?1|channel ?1|u)\b/, [time]);
  const displacement = find(/^((x|z|d)\b|disp|pos|deflection|height|travel|reading|ch ?2|channel ?2)/, [time, volts]);
  const fallback = { time: 0, volts: 1, displacement: 2 };
  if (time < 0 || volts < 0 || displacement < 0) return fallback;
  return { time, volts, displacement };
}

/** The samples of the mapped columns (time converted to seconds); lines with a missing or bad number are left out with a message. */
export function samplesFromTable(
  table: SineTable,
  mapping: ColumnMapping,
  timeUnit: TimeUnit,
): { samples: SineSample[]; problems: RowProblem[] } {
  const samples: SineSample[] = [];
  const problems: RowProblem[] = [];
  const scale = timeUnits[timeUnit];
  for (const { line, cells } of table.lines) {
    const t = readNumber(cells[mapping.time], 'time');
    const v = readNumber(cells[mapping.volts], 'drive');
    const x = readNumber(cells[mapping.displacement], 'displacement');
    if ('value' in t && 'value' in v && 'value' in x) samples.push({ timeS: t.value * scale, volts: v.value, displacement: x.value });
    else problems.push({ line, message: `${[t, v, x].flatMap((r) => ('problem' in r ? [r.problem] : [])).join('; ')}.` });
  }
  return { samples, problems };
}
