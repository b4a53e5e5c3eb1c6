// Reads a NIST/ITL StRD linear-regression file: data and certified values come from the file
// itself. Understands NIST's original layout (Norris.dat: "B0 est sd" lines, "Residual Standard
// Deviation", "R-Squared", the ANOVA "Residual df SS MS" line and a "Data: y x" block) and the
// compact commented layout used by our NoInt copies ("# Certified: B1 = … (sd …)", "# y x").
import { readFileSync } from 'node:fs';

/** Certified values of one dataset; intercept fields are absent for no-intercept models. */
export interface StrdCertified {
  slope: number;
  slopeSd: number;
  intercept?: number;
  interceptSd?: number;
  residualSd: number;
  r2: number;
  residualSumSquares?: number;
}

/** One StRD dataset: the model it certifies, its observations and certified values. */
export interface StrdDataset {
  model: 'intercept' | 'origin';
  x: number[];
  y: number[];
  certified: StrdCertified;
}

const NUMBER = '([-+]?\\d*\\.?\\d+(?:[eE][-+]?\\d+)?)';

function find(text: string, patterns: RegExp[]): RegExpMatchArray | null {
  for (const pattern of patterns) {
    const match = text.match(pattern);
    if (match) return match;
  }
  return null;
}

function required(text: string, what: string, patterns: RegExp[], group = 1): number {
  const match = find(text, patterns);
  if (!match) throw new Error(`StRD file: no ${what}`);
  return Number(match[group]);
}

/** Parses the text of a StRD file (pure; see readStrdFile for the file system). */
export function parseStrd(text: string): StrdDataset {
  const b0 = text.match(new RegExp(`^\\s*B0\\s+${NUMBER}\\s+${NUMBER}`, 'm'));
  const b1 = find(text, [
    new RegExp(`^\\s*B1\\s+${NUMBER}\\s+${NUMBER}`, 'm'),
    new RegExp(`B1\\s*=\\s*${NUMBER}\\s*\\(sd\\s+${NUMBER}\\)`, 'i'),
  ]);
  if (!b1) throw new Error('StRD file: no certified B1');
  const residualSd = required(text, 'residual standard deviation', [
    new RegExp(`Residual\\s+Standard Deviation\\s+${NUMBER}`),
    new RegExp(`residual standard deviation\\s*=\\s*${NUMBER}`, 'i'),
  ]);
  const r2 = required(text, 'R-squared', [new RegExp(`R-Squared\\s+${NUMBER}`), new RegExp(`R-squared[^=\\n]*=\\s*${NUMBER}`, 'i')]);
  const rss = find(text, [
    new RegExp(`^Residual\\s+\\d+\\s+${NUMBER}\\s+${NUMBER}`, 'm'),
    new RegExp(`residual sum of squares\\s*=\\s*${NUMBER}`, 'i'),
  ]);

  const lines = text.split(/\r?\n/);
  const header = lines.findIndex((line) => /^(?:Data:|#)\s*(?:y\s+x|x\s+y)\s*$/.test(line.trim()));
  if (header < 0) throw new Error('StRD file: no data header');
  const yFirst = /y\s+x/.test(lines[header]);
  const x: number[] = [];
  const y: number[] = [];
  for (const line of lines.slice(header + 1)) {
    const fields = line.trim().split(/\s+/).filter(Boolean);
    if (fields.length !== 2) continue;
    const [first, second] = fields.map(Number);
    if (!Number.isFinite(first) || !Number.isFinite(second)) continue;
    x.push(yFirst ? second : first);
    y.push(yFirst ? first : second);
  }

  return {
    model: b0 ? 'intercept' : 'origin',
    x,
    y,
    certified: {
      slope: Number(b1[1]),
      slopeSd: Number(b1[2]),
      ...(b0 ? { intercept: Number(b0[1]), interceptSd: Number(b0[2]) } : {}),
      residualSd,
      r2,
      ...(rss ? { residualSumSquares: Number(rss[1]) } : {}),
    },
  };
}

/** Reads and parses a StRD file from disk (tests only). */
export function readStrdFile(path: string | URL): StrdDataset {
  return parseStrd(readFileSync(path, 'utf8'));
}
