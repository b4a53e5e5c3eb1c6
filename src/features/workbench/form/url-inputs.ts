// A workbench page's inputs as URL search params, so a result can be shared as a link and survives a reload.
// Scalars are plain `key=value`; a numeric matrix is `gain=70.7,-70.7;70.7,70.7`; a grid of typed rows is one
// compact param (`pts=0,0.1,u;10,1.0,d`, cells escaped with `~` so a decimal comma typed in a cell stays a cell).
// Reading is field by field with the page's own form schema: a bad param falls back to that field's default.
import type { z } from 'zod';
import { queryText } from '@shared/workbench/start-links.ts';

/** A grid field (an array of row objects) kept as one param: the columns in order, each maybe abbreviated. */
export interface UrlGrid {
  param: string;
  columns: readonly string[];
  /** Short spellings per column value, e.g. `{ sweep: { up: 'u', down: 'd' } }`. */
  short?: Readonly<Record<string, Readonly<Record<string, string>>>>;
}

/** What a page keeps out of its link (`skip`: pasted records), and its grids. */
export interface UrlInputOptions {
  skip?: readonly string[];
  grids?: Readonly<Record<string, UrlGrid>>;
}

type Def = { type: string; in?: Schema; innerType?: Schema; shape?: Record<string, Schema> };
type Schema = z.ZodType & { _zod: { def: Def } };

const defOf = (s: Schema): Def => s._zod.def;

/** The object schema under a form schema's refinements, transforms and pipes. */
function objectOf(schema: Schema): Schema | undefined {
  let s: Schema | undefined = schema;
  for (let i = 0; s && i < 10; i++) {
    const d = defOf(s);
    if (d.type === 'object') return s;
    s = d.type === 'pipe' ? d.in : d.type === 'optional' || d.type === 'default' || d.type === 'nullable' ? d.innerType : undefined;
  }
  return undefined;
}

/** The scalar kind of a leaf schema once optional/default wrappers are off. */
function leafKind(schema: Schema): string {
  let s = schema;
  for (let i = 0; i < 10; i++) {
    const d = defOf(s);
    if ((d.type === 'optional' || d.type === 'default' || d.type === 'nullable') && d.innerType) s = d.innerType;
    else if (d.type === 'pipe' && d.in) s = d.in;
    else return d.type;
  }
  return 'unknown';
}

interface Leaf {
  path: string[];
  schema: Schema;
  kind: string;
}

function leavesOf(object: Schema, prefix: string[] = []): Leaf[] {
  const shape = defOf(object).shape ?? {};
  const out: Leaf[] = [];
  for (const [key, field] of Object.entries(shape)) {
    const inner = objectOf(field);
    if (inner && leafKind(field) === 'object') out.push(...leavesOf(inner, [...prefix, key]));
    else out.push({ path: [...prefix, key], schema: field, kind: leafKind(field) });
  }
  return out;
}

/** Param names: the last path segment where it is unique among the leaves, else the dotted path. */
function paramNames(leaves: Leaf[], grids: UrlInputOptions['grids'] = {}): Map<string, string> {
  const counts = new Map<string, number>();
  for (const l of leaves) counts.set(l.path.at(-1)!, (counts.get(l.path.at(-1)!) ?? 0) + 1);
  const names = new Map<string, string>();
  for (const l of leaves) {
    const dotted = l.path.join('.');
    names.set(dotted, grids[dotted]?.param ?? (counts.get(l.path.at(-1)!) === 1 ? l.path.at(-1)! : dotted));
  }
  return names;
}

const getAt = (o: unknown, path: readonly string[]): unknown =>
  path.reduce<unknown>((v, k) => (v !== null && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined), o);

function setAt(o: Record<string, unknown>, path: readonly string[], value: unknown): void {
  let cur = o;
  for (const k of path.slice(0, -1)) {
    if (cur[k] === null || typeof cur[k] !== 'object') cur[k] = {};
    cur = cur[k] as Record<string, unknown>;
  }
  cur[path.at(-1)!] = value;
}

/** `~` escapes so a cell may hold `,` or `;` (a decimal comma): `~c` `,`, `~s` `;`, `~t` `~`. */
export const escapeCell = (s: string) => s.replace(/~/g, '~t').replace(/,/g, '~c').replace(/;/g, '~s');
export const unescapeCell = (s: string) => s.replace(/~([cst])/g, (_, c: string) => (c === 'c' ? ',' : c === 's' ? ';' : '~'));

const numberText = (n: unknown) => (typeof n === 'number' && Number.isFinite(n) ? String(n) : '');

function encodeGrid(rows: unknown, grid: UrlGrid): string {
  if (!Array.isArray(rows)) return '';
  return rows
    .map((row) =>
      grid.columns
        .map((c) => {
          const raw = getAt(row, [c]);
          const text = typeof raw === 'number' ? numberText(raw) : typeof raw === 'string' ? raw : '';
          return escapeCell(grid.short?.[c]?.[text] ?? text);
        })
        .join(','),
    )
    .join(';');
}

function decodeGrid(text: string, grid: UrlGrid): Record<string, string>[] {
  if (text === '') return [];
  return text.split(';').map((r) => {
    const cells = r.split(',').map(unescapeCell);
    return Object.fromEntries(
      grid.columns.map((c, i) => {
        const cell = cells[i] ?? '';
        const long = Object.entries(grid.short?.[c] ?? {}).find(([, s]) => s === cell)?.[0];
        return [c, long ?? cell];
      }),
    );
  });
}

/** A nested array of numbers as `a,b;c,d` (rows by `;`), or a flat one as `a,b`. */
function encodeMatrix(v: unknown): string {
  if (!Array.isArray(v)) return '';
  return v.map((r) => (Array.isArray(r) ? r.map(numberText).join(',') : numberText(r))).join(Array.isArray(v[0]) ? ';' : ',');
}

function decodeMatrix(text: string, nested: boolean): unknown {
  const num = (s: string) => (s.trim() === '' ? Number.NaN : Number(s));
  return nested ? text.split(';').map((r) => r.split(',').map(num)) : text.split(',').map(num);
}

function encodeLeaf(value: unknown, kind: string, grid?: UrlGrid): string | undefined {
  if (value === undefined || value === null) return undefined;
  if (grid) return encodeGrid(value, grid);
  if (kind === 'tuple' || kind === 'array') return encodeMatrix(value);
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : undefined;
  if (typeof value === 'boolean') return value ? '1' : '0';
  return typeof value === 'string' ? value : undefined;
}

function decodeLeaf(text: string, kind: string, defaultValue: unknown, grid?: UrlGrid): unknown {
  if (grid) return decodeGrid(text, grid);
  if (kind === 'tuple' || kind === 'array') return decodeMatrix(text, Array.isArray(defaultValue) && Array.isArray(defaultValue[0]));
  if (kind === 'number') return text.trim() === '' ? undefined : Number(text.replace(',', '.'));
  if (kind === 'boolean') return text === '1' || text === 'true';
  return text;
}

/**
 * The search string (`?a=1&b=x`, or '' when everything is at its default) for a page's form values:
 * only fields that differ from `defaults`, an emptied field as `key=` so a reload keeps it empty.
 */
export function encodeInputs(schema: z.ZodType, values: unknown, defaults: unknown, options: UrlInputOptions = {}): string {
  const object = objectOf(schema as Schema);
  if (!object) return '';
  const leaves = leavesOf(object);
  const names = paramNames(leaves, options.grids);
  const pairs: [string, string][] = [];
  for (const leaf of leaves) {
    const dotted = leaf.path.join('.');
    if (options.skip?.includes(dotted)) continue;
    const value = getAt(values, leaf.path);
    const fallback = getAt(defaults, leaf.path);
    const grid = options.grids?.[dotted];
    const text = encodeLeaf(value, leaf.kind, grid) ?? '';
    if (text === (encodeLeaf(fallback, leaf.kind, grid) ?? '')) continue;
    pairs.push([names.get(dotted)!, text]);
  }
  return pairs.length > 0 ? `?${queryText(pairs)}` : '';
}

/**
 * Form values from a page's URL search: each field the params name is checked with its own part of the
 * page's form schema; a missing or refused one keeps its default (skipped fields always do). Never throws.
 */
export function decodeInputs<T>(schema: z.ZodType, params: URLSearchParams, defaults: T, options: UrlInputOptions = {}): T {
  const out = structuredClone(defaults) as Record<string, unknown>;
  const object = objectOf(schema as Schema);
  if (!object) return out as T;
  const leaves = leavesOf(object);
  const names = paramNames(leaves, options.grids);
  for (const leaf of leaves) {
    const dotted = leaf.path.join('.');
    if (options.skip?.includes(dotted)) continue;
    const text = params.get(names.get(dotted)!);
    if (text === null) continue;
    try {
      const grid = options.grids?.[dotted];
      const value = decodeLeaf(text, leaf.kind, getAt(defaults, leaf.path), grid);
      if (leaf.schema.safeParse(value).success) setAt(out, leaf.path, value);
    } catch {
      // A param this field cannot read keeps the default.
    }
  }
  return out as T;
}
