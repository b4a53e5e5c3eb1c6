// A height image typed or pasted as text: one row per line, numbers split by commas, semicolons, tabs or
// spaces. With semicolons or tabs as separators a comma is read as a decimal comma.

export type ParsedMatrix = { ok: true; rows: number[][] } | { ok: false; message: string };

export function parseMatrix(text: string): ParsedMatrix {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== '' && !/^\s*#/.test(l));
  if (lines.length === 0) return { ok: false, message: 'Paste or load a height image: one row of numbers per line.' };
  const rows: number[][] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!.trim();
    const decimalComma = /[;\t]/.test(line);
    const cells = decimalComma ? line.split(/[;\t]+/).map((c) => c.trim().replace(',', '.')) : line.split(/[\s,]+/);
    const row = cells.filter((c) => c !== '').map(Number);
    const bad = row.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) {
      if (i === 0 && rows.length === 0) continue; // a header line
      return { ok: false, message: `Line ${i + 1}, value ${bad + 1} is not a number.` };
    }
    rows.push(row);
  }
  if (rows.length === 0) return { ok: false, message: 'No rows of numbers found.' };
  return { ok: true, rows };
}
