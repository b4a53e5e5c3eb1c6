import type { z } from 'zod';

/**
 * A page's search read from the URL with the same shared zod schema the API validates it with, field
 * by field: a value the schema refuses falls back to the field's default (or is left out), so an odd
 * or old link still opens the page. `format` and other fields a page does not keep in its URL are skipped.
 */
export function readSearch<S extends z.ZodObject>(schema: S, params: URLSearchParams, skip: readonly string[] = []): Partial<z.output<S>> {
  const out: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(schema.shape) as [string, z.ZodType][]) {
    if (skip.includes(key)) continue;
    const raw = params.get(key);
    const given = raw === null || raw.trim() === '' ? undefined : raw;
    const parsed = field.safeParse(given);
    const value = parsed.success ? parsed.data : field.safeParse(undefined).data;
    if (value !== undefined) out[key] = value;
  }
  return out as Partial<z.output<S>>;
}

/** A search string (`?a=1&b=x`, or '' when empty) from values, leaving out empty ones and those equal to `defaults`. */
export function writeSearch(values: Record<string, unknown>, defaults: Record<string, unknown> = {}): string {
  const s = new URLSearchParams();
  for (const [key, value] of Object.entries(values)) {
    if (value === undefined || value === null || value === '' || value === false || defaults[key] === value) continue;
    s.set(key, String(value));
  }
  const text = s.toString();
  return text ? `?${text}` : '';
}
