// Flattens a request body's JSON Schema into rows a table can show: a dotted name, a type in words,
// whether it is required, and what limits it (enum, range, default, description).
import type { JsonSchema } from '../openapi-types.ts';

export interface FieldRow {
  name: string;
  type: string;
  required: boolean;
  notes: string[];
}

/** One alternative of a body (a discriminated union such as a run's three kinds), with its rows. */
export interface BodyVariant {
  label: string | null;
  rows: FieldRow[];
}

const MAX_DEPTH = 4;

function typeOf(s: JsonSchema): string {
  if (s.const !== undefined) return JSON.stringify(s.const);
  if (s.enum) return 'string';
  const alternatives = s.oneOf ?? s.anyOf;
  if (alternatives) return [...new Set(alternatives.map(typeOf))].join(' or ');
  if (s.type === 'array') return s.prefixItems ? `[${s.prefixItems.map(typeOf).join(', ')}]` : `${s.items ? typeOf(s.items) : 'any'}[]`;
  if (Array.isArray(s.type)) return s.type.join(' or ');
  return s.type ?? 'any';
}

function notesOf(s: JsonSchema): string[] {
  const notes: string[] = [];
  if (s.description) notes.push(s.description);
  if (s.enum) notes.push(`one of ${s.enum.map((v) => JSON.stringify(v)).join(', ')}`);
  const lo = s.minimum ?? s.exclusiveMinimum;
  const hi = s.maximum ?? s.exclusiveMaximum;
  if (lo !== undefined || hi !== undefined) {
    const low = lo === undefined ? '' : `${s.exclusiveMinimum !== undefined ? '>' : '≥'} ${lo}`;
    const high = hi === undefined || hi >= Number.MAX_SAFE_INTEGER ? '' : `${s.exclusiveMaximum !== undefined ? '<' : '≤'} ${hi}`;
    if (low || high) notes.push([low, high].filter(Boolean).join(', '));
  }
  if (s.minLength !== undefined || s.maxLength !== undefined) notes.push(`${s.minLength ?? 0}–${s.maxLength ?? '∞'} characters`);
  if (s.minItems !== undefined || s.maxItems !== undefined)
    notes.push(`${s.minItems ?? 0}–${s.maxItems?.toLocaleString('en-GB') ?? '∞'} items`);
  if (s.format) notes.push(s.format === 'date' ? 'date, YYYY-MM-DD' : s.format);
  if (s.default !== undefined) notes.push(`default ${JSON.stringify(s.default)}`);
  return notes;
}

function objectOf(s: JsonSchema): JsonSchema | null {
  if (s.properties) return s;
  if (s.type === 'array' && s.items?.properties) return s.items;
  const objects = (s.oneOf ?? s.anyOf ?? []).filter((o) => o.properties);
  return objects.length === 1 ? objects[0]! : null;
}

function walk(s: JsonSchema, prefix: string, out: FieldRow[], depth: number): void {
  const required = new Set(s.required ?? []);
  for (const [name, prop] of Object.entries(s.properties ?? {})) {
    const full = prefix ? `${prefix}.${name}` : name;
    out.push({ name: full, type: typeOf(prop), required: required.has(name), notes: notesOf(prop) });
    const inner = objectOf(prop);
    if (inner && depth < MAX_DEPTH) walk(inner, prop.type === 'array' ? `${full}[]` : full, out, depth + 1);
  }
}

/** The body's fields; a union of objects becomes one variant per alternative, named by its constant field. */
export function bodyVariants(schema: JsonSchema): BodyVariant[] {
  const alternatives = (schema.oneOf ?? schema.anyOf)?.filter((a) => a.properties);
  if (alternatives && alternatives.length > 1) {
    return alternatives.map((alt) => {
      const tag = Object.entries(alt.properties ?? {}).find(([, p]) => p.const !== undefined);
      const rows: FieldRow[] = [];
      walk(alt, '', rows, 1);
      return { label: tag ? `${tag[0]}: ${JSON.stringify(tag[1].const)}` : null, rows };
    });
  }
  const rows: FieldRow[] = [];
  walk(objectOf(schema) ?? schema, '', rows, 1);
  return [{ label: null, rows }];
}

/** A parameter's schema as a type and notes, for the parameters table. */
export const describeSchema = (s: JsonSchema | undefined) => (s ? { type: typeOf(s), notes: notesOf(s) } : { type: 'string', notes: [] });
