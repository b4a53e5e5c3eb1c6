// The one way typed or pasted numbers are read on every page: a decimal point or comma, a true minus sign, e notation.
const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/** A number as makers type or paste it ("1.5", "-2", "3e-2", "1,5"); NaN when it is not one. */
export function parseNumber(text: string): number {
  const t = text.trim().replace(/\u2212/g, '-');
  if (!NUMBER.test(t)) return Number.NaN;
  return Number(t.replace(',', '.'));
}

/** Empty text means "not given" (undefined); anything else must be a number (NaN otherwise). */
export function parseOptionalNumber(text: string | undefined): number | undefined {
  return text === undefined || text.trim() === '' ? undefined : parseNumber(text);
}
