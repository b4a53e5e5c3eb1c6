// Hostile input against every JSON body and query string the app takes, the list derived from the
// app's own router stack. A refusal is always 4xx in the error shape, never 5xx, and leaves the
// rows it aimed at exactly as they were; Object.prototype stays clean throughout.
import { afterAll, describe, expect, test } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse as parseQuery } from 'node:querystring';
import { gzipSync } from 'node:zlib';
import fc from 'fast-check';
import type { z } from 'zod';
import { listBuildsQuery } from '@shared/schemas/build.ts';
import { listPartsQuery } from '@shared/schemas/part.ts';
import { listListingsQuery } from '@shared/schemas/listing.ts';
import { listUsersQuery } from '@shared/schemas/user.ts';
import { auditQuery } from '@shared/schemas/review.ts';
import { notificationsQuery } from '@shared/schemas/notification.ts';
import { startTestApp } from '../support/test-app.ts';
import { visitor } from '../support/login.ts';
import { listRoutes, stateChangingRoutes, type RouteEntry } from '../support/route-table.ts';
import { actorPool, armed, fixtures, send } from '../support/matrix-fixtures.ts';

const uploadsDir = mkdtempSync(join(tmpdir(), 'scanwright-hostile-'));
const t = await startTestApp({ uploadsDir });
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

// HOSTILE_RUNS=200 npm test -- --project api tests/api/hostile-input.test.ts digs deeper.
const RUNS = Number(process.env.HOSTILE_RUNS ?? 12);
const prototypeNames = Object.getOwnPropertyNames(Object.prototype).sort();
const expectCleanPrototype = () => {
  expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeNames);
  expect(({} as Record<string, unknown>).polluted).toBeUndefined();
};
const errorShape = { error: { code: expect.stringMatching(/^[a-z_]+$/), message: expect.any(String) } };

const pool = actorPool(t);
const armedFor = async (route: RouteEntry) => {
  const { fixture, target, actor } = await armed(t, pool, route);
  return { fixture, target, agent: actor.agent };
};

const cached = <T>(make: (n: number) => T) => {
  const made = new Map<number, T>();
  return (n: number) => made.get(n) ?? (made.set(n, make(n)), made.get(n)!);
};
/** A JSON body one byte over the limit, and one that inflates to over it from a few kilobytes. */
const oversized = cached((limit) => `{"x":"${'x'.repeat(limit - 7)}"}`);
const gzipBomb = cached((limit) => gzipSync(`{"x":"${' '.repeat(limit)}"}`));
const limitOf = (route: RouteEntry) => (/^\/api\/(workbench|actuators|runs)\//.test(route.path) ? 32 * 1024 * 1024 : 1024 * 1024);

// ---- JSON built from mutated valid bodies ---------------------------------------------------

/** JSON text spliced in verbatim (1e309, deep nesting, lone surrogates) where a JS value cannot say it. */
class Raw {
  constructor(readonly text: string) {}
}
type Json = unknown;
const own = (entries: Array<[string, Json]>) => {
  const o: Record<string, Json> = {};
  for (const [k, v] of entries) Object.defineProperty(o, k, { value: v, enumerable: true, writable: true, configurable: true });
  return o;
};
const clone = (v: Json): Json =>
  v instanceof Raw || v === null || typeof v !== 'object'
    ? v
    : Array.isArray(v)
      ? v.map(clone)
      : own(Object.entries(v).map(([k, x]) => [k, clone(x)]));
function toJson(v: Json): string {
  if (v instanceof Raw) return v.text;
  if (Array.isArray(v)) return `[${v.map(toJson).join(',')}]`;
  if (v !== null && typeof v === 'object')
    return `{${Object.entries(v)
      .map(([k, x]) => `${JSON.stringify(k)}:${toJson(x)}`)
      .join(',')}}`;
  return typeof v === 'number' && !Number.isFinite(v) ? String(v) : (JSON.stringify(v) ?? 'null');
}
type Path = Array<string | number>;
function pathsOf(v: Json, at: Path = []): Path[] {
  if (v === null || typeof v !== 'object' || v instanceof Raw) return [at];
  return [at, ...Object.entries(v).flatMap(([k, x]) => pathsOf(x, [...at, Array.isArray(v) ? Number(k) : k]))];
}
const parentOf = (root: Json, path: Path) =>
  path.slice(0, -1).reduce<Json>((node, k) => (node as Record<string | number, Json>)[k], root) as Record<string | number, Json>;

const MB = 1024 * 1024;
const deep = (levels: number) => new Raw('{"a":'.repeat(levels) + '1' + '}'.repeat(levels));
const pollution = () =>
  own([
    ['__proto__', own([['polluted', 'yes']])],
    ['constructor', own([['prototype', own([['polluted', 'yes']])]])],
    ['prototype', own([['polluted', 'yes']])],
  ]);
const hostileValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(
    null,
    true,
    false,
    0,
    -1,
    1.5,
    -0.5,
    2 ** 53 + 1,
    1e308,
    -1e308,
    5e-324,
    '',
    ' ',
    'NaN',
    'Infinity',
    '-Infinity',
    '1e309',
    '0x10',
    '🔬\u0000\u202e',
    [],
    {},
    [1, 2, 3],
  ),
  fc.constantFrom(new Raw('1e309'), new Raw('-1e309'), new Raw('1e-400'), new Raw('"\\ud800"'), new Raw('"\\u0000"'), deep(200)),
  fc.constantFrom(
    'x'.repeat(MB),
    'é'.repeat(300_000),
    Array.from({ length: 20_000 }, (_, i) => i),
    Array.from({ length: 2_000 }, () => ({})),
  ),
  fc.string(),
  fc.integer(),
  fc.double(),
  fc.constant(null).map(pollution),
);
const hostileKey = fc.oneof(fc.constantFrom('__proto__', 'constructor', 'prototype', 'extra', 'toString', 'hasOwnProperty'), fc.string());

type Mutation =
  | { kind: 'replace'; path: Path; value: Json }
  | { kind: 'delete'; path: Path }
  | { kind: 'add'; path: Path; key: string; value: Json }
  | { kind: 'root'; text: string };
function mutations(body: Json): fc.Arbitrary<Mutation[]> {
  const all = pathsOf(body);
  const objects = all.filter((p) => {
    const node = p.length === 0 ? body : parentOf(body, [...p, '']);
    return node !== null && typeof node === 'object' && !Array.isArray(node);
  });
  const one: fc.Arbitrary<Mutation> = fc.oneof(
    {
      weight: 4,
      arbitrary: fc.record({
        kind: fc.constant('replace' as const),
        path: fc.constantFrom(...all.filter((p) => p.length > 0)),
        value: hostileValue,
      }),
    },
    {
      weight: 2,
      arbitrary: fc.record({ kind: fc.constant('delete' as const), path: fc.constantFrom(...all.filter((p) => p.length > 0)) }),
    },
    {
      weight: 3,
      arbitrary: fc.record({ kind: fc.constant('add' as const), path: fc.constantFrom(...objects), key: hostileKey, value: hostileValue }),
    },
    {
      weight: 1,
      arbitrary: fc.record({
        kind: fc.constant('root' as const),
        text: fc.constantFrom(
          '[]',
          '"text"',
          'null',
          '1',
          '{',
          '{"a":1}x',
          toJson(deep(10_000)),
          `[${'['.repeat(10_000)}${']'.repeat(10_000)}]`,
        ),
      }),
    },
  );
  return fc.array(one, { minLength: 1, maxLength: 3 });
}
function apply(body: Json, muts: Mutation[]): string {
  let root = clone(body);
  for (const m of muts) {
    if (m.kind === 'root') return m.text;
    // Earlier mutations may have replaced an ancestor with a primitive; such a path no longer exists.
    let node: Json;
    try {
      node = m.kind === 'add' ? (m.path.length ? parentOf(root, [...m.path, '']) : root) : parentOf(root, m.path);
    } catch {
      continue;
    }
    if (node === null || typeof node !== 'object' || node instanceof Raw) continue;
    const obj = node as Record<string | number, Json>;
    const last = m.path[m.path.length - 1]!;
    if (m.kind === 'replace') obj[last] = m.value;
    else if (m.kind === 'delete') {
      if (Array.isArray(obj)) obj.splice(Number(last), 1);
      else delete obj[last];
    } else if (!Array.isArray(obj))
      Object.defineProperty(obj, m.key, { value: m.value, enumerable: true, writable: true, configurable: true });
    if (m.kind === 'replace' && m.path.length === 0) root = m.value;
  }
  return toJson(root);
}
/** What the server's JSON parser and schema would make of the text: only a plain object within the limit that the schema accepts is valid. */
function acceptedBySchema(text: string, schema: z.ZodType, limit: number): boolean {
  try {
    const parsed: unknown = JSON.parse(text);
    return (
      parsed !== null &&
      typeof parsed === 'object' &&
      !Array.isArray(parsed) &&
      Buffer.byteLength(text) <= limit &&
      schema.safeParse(parsed).success
    );
  } catch {
    return false;
  }
}

const stateRoutes = stateChangingRoutes(t.app);
const bodyRoutes = stateRoutes.filter((r) => fixtures[r.key]?.schema);

describe('the route table', () => {
  test('when the app is walked, then every state-changing route has a fixture, every JSON body a schema, and every query-validating GET route a schema here', async () => {
    const admin = await pool.shared('admin');
    expect(stateRoutes.filter((r) => !fixtures[r.key]).map((r) => r.key)).toEqual([]);
    for (const r of stateRoutes) {
      const { fixture, target } = await armedFor(r);
      expect(fixture.schema !== undefined, `${r.key}: a JSON body needs its schema`).toBe(target.body !== undefined);
    }
    for (const r of queryRoutes()) {
      const probe = await admin.agent.get(`${r.path}?zz_probe=1`);
      expect(probe.status === 400 ? r.key in querySchemas : true, `${r.key} validates its query but has no schema here`).toBe(true);
    }
    expect(Object.keys(querySchemas).filter((k) => !queryRoutes().some((r) => r.key === k))).toEqual([]);
  });
});

describe.concurrent.each(bodyRoutes)('$key with a hostile JSON body', (route) => {
  test('when fields are retyped, dropped, added (incl. __proto__), huge or deeply nested, then a refusal is 4xx in the error shape and changes nothing', async () => {
    const { fixture, target, agent } = await armedFor(route);
    const examples: [string][] = [
      [apply(target.body, [{ kind: 'add', path: [], key: '__proto__', value: own([['polluted', 'yes']]) }])],
      [apply(target.body, [{ kind: 'add', path: [], key: 'constructor', value: pollution() }])],
      [toJson(deep(10_000))],
      [apply(target.body, [{ kind: 'replace', path: pathsOf(target.body).at(-1)!, value: new Raw('1e309') }])],
      [apply(target.body, [{ kind: 'replace', path: pathsOf(target.body).at(-1)!, value: 'x'.repeat(MB) }])],
    ];
    await fc.assert(
      fc.asyncProperty(
        mutations(target.body).map((m) => apply(target.body, m)),
        async (text) => {
          const before = await target.state();
          const res = await send(route, target, agent, { raw: text, headers: { 'Content-Type': 'application/json' } });
          expect(res.status, `${res.status} for ${text.slice(0, 300)}: ${res.text.slice(0, 300)}`).toBeLessThan(500);
          if (res.status >= 400) expect(res.body).toMatchObject(errorShape);
          if (!acceptedBySchema(text, fixture.schema!, limitOf(route))) {
            expect(res.status, `accepted ${text.slice(0, 300)}`).toBeGreaterThanOrEqual(400);
            expect(await target.state()).toEqual(before);
          }
          expectCleanPrototype();
        },
      ),
      { numRuns: RUNS, examples },
    );
  });
});

describe('workbench calculations at the edge of double precision', () => {
  const workbenchRoutes = bodyRoutes.filter((r) => r.key.startsWith('POST /api/workbench/'));
  const extreme = fc.constantFrom(1e308, -1e308, 1.7976931348623157e308, 5e-324, -5e-324, 1e-300, 1e300, 2 ** 53 + 1);
  /** Paths of the plain numbers in an answer (array items aside, their count may vary). */
  const numberPaths = (v: unknown, at: string[] = []): string[][] =>
    typeof v === 'number'
      ? [at]
      : v && typeof v === 'object' && !Array.isArray(v)
        ? Object.entries(v).flatMap(([k, x]) => numberPaths(x, [...at, k]))
        : [];
  /** Answer fields documented as null in some cases (FitResultDto: r2 and the %FS figures). */
  const nullable: Record<string, string[]> = { 'POST /api/workbench/fit': ['r2', 'nonlinearityPctFs', 'hysteresisPctFs'] };
  const at = (v: unknown, path: string[]) => path.reduce<unknown>((node, k) => (node as Record<string, unknown> | null)?.[k], v);

  test.concurrent.each(workbenchRoutes)(
    'when $key gets finite but extreme numbers, then it answers 400, or 200 with every number still a number (never null from NaN or Infinity)',
    async (route) => {
      const { target, agent } = await armedFor(route);
      const baseline = await send(route, target, agent);
      expect(baseline.status).toBe(200);
      const numeric = pathsOf(target.body).filter((p) => typeof at(target.body, p.map(String)) === 'number');
      await fc.assert(
        fc.asyncProperty(fc.array(fc.tuple(fc.constantFrom(...numeric), extreme), { minLength: 1, maxLength: 4 }), async (changes) => {
          const text = apply(
            target.body,
            changes.map(([path, value]) => ({ kind: 'replace' as const, path, value })),
          );
          const res = await send(route, target, agent, { raw: text, headers: { 'Content-Type': 'application/json' } });
          expect(res.status, `${text}: ${res.text.slice(0, 300)}`).toBeLessThan(500);
          if (res.status >= 400) return void expect(res.body).toMatchObject(errorShape);
          for (const path of numberPaths(baseline.body).filter((p) => !nullable[route.key]?.includes(p.join('.'))))
            expect(at(res.body, path), `${path.join('.')} for ${text}`).not.toBeNull();
        }),
        { numRuns: RUNS },
      );
    },
  );

  test('when 20 000 points are all wrong, then the 400 lists only the first issues instead of echoing 60 000 of them', async () => {
    const points = Array.from({ length: 20_000 }, () => ({ volts: 'x', displacement: 'y', extra: 1 }));
    const res = await (await pool.shared('owner')).agent.post('/api/workbench/fit').send({ points, displacementUnit: 'nm' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: expect.any(Array) } });
    expect(res.body.error.details.length).toBeLessThanOrEqual(50);
    expect(res.text.length).toBeLessThan(20_000);
  });
});

describe('hostile JSON from a visitor', () => {
  test.concurrent.each(bodyRoutes.filter((r) => !r.key.startsWith('POST /api/workbench/')))(
    'when a visitor sends a malformed-by-schema body to $key, then 401 like a valid one, never a validation answer',
    async (route) => {
      const { target } = await armedFor(route);
      const guest = await visitor(t);
      await fc.assert(
        fc.asyncProperty(
          mutations(target.body).map((m) => apply(target.body, m)),
          async (text) => {
            fc.pre(
              Buffer.byteLength(text) <= MB &&
                (() => {
                  try {
                    JSON.parse(text);
                    return text.startsWith('{');
                  } catch {
                    return false;
                  }
                })(),
            );
            const res = await send(route, target, guest, { raw: text, headers: { 'Content-Type': 'application/json' } });
            expect(res.status, text.slice(0, 200)).toBe(401);
            expect(res.body).toMatchObject({ error: { code: 'unauthorized' } });
          },
        ),
        { numRuns: 4 },
      );
    },
  );
});

describe.concurrent.each(stateRoutes)('$key with a body the parser must refuse', (route) => {
  test('when it is malformed, not UTF-8, in an unknown charset or encoding, or over the limit (plain or gzipped), then 4xx in the error shape and nothing changes', async () => {
    const { target, agent } = await armedFor(route);
    const before = await target.state();
    const json = { 'Content-Type': 'application/json' };
    const cases: Array<[string, string | Buffer, Record<string, string>, number, string]> = [
      ['malformed', '{"title":', json, 400, 'malformed_json'],
      [
        'invalid UTF-8',
        Buffer.concat([Buffer.from('{"title":"caf'), Buffer.from([0xc3, 0x28, 0xff]), Buffer.from('"}')]),
        json,
        400,
        'malformed_json',
      ],
      ['an unknown charset', '{}', { 'Content-Type': 'application/json; charset=latin9' }, 415, 'unsupported_encoding'],
      ['an unknown content encoding', '{}', { ...json, 'Content-Encoding': 'x-zip' }, 415, 'unsupported_encoding'],
      ['over the limit', oversized(limitOf(route)), json, 413, 'payload_too_large'],
      ['a gzip bomb', gzipBomb(limitOf(route)), { ...json, 'Content-Encoding': 'gzip' }, 413, 'payload_too_large'],
    ];
    for (const [what, raw, headers, status, code] of cases) {
      const res = await send(route, target, agent, { headers, raw });
      expect(res.status, `${what}: ${res.text.slice(0, 200)}`).toBe(status);
      expect(res.body).toEqual({ error: { code, message: expect.any(String) } });
    }
    expect(await target.state()).toEqual(before);
    expectCleanPrototype();
  });
});

// ---- query strings --------------------------------------------------------------------------

const querySchemas: Record<string, z.ZodObject> = {
  'GET /api/builds': listBuildsQuery,
  'GET /api/parts': listPartsQuery,
  'GET /api/listings': listListingsQuery,
  'GET /api/admin/users': listUsersQuery,
  'GET /api/review/audit': auditQuery,
  'GET /api/notifications': notificationsQuery,
};
function queryRoutes() {
  return listRoutes(t.app).filter((r) => r.method === 'GET' && r.path.startsWith('/api/') && !r.path.includes(':'));
}

const queryValue = fc.oneof(
  fc.constantFrom(
    '',
    '1',
    '0',
    '-1',
    '1.5',
    'NaN',
    'Infinity',
    '-Infinity',
    '1e309',
    '1e3',
    '0x10',
    'true',
    '%',
    '\\',
    '_',
    '🔬',
    '\u0000',
    'a'.repeat(2000),
  ),
  fc.string({ maxLength: 40 }),
  fc.integer().map(String),
);
function queryString(keys: string[]) {
  const key = fc.oneof(
    fc.constantFrom(...keys),
    fc.constantFrom(
      ...keys.map((k) => `${k}[]`),
      ...keys.map((k) => `${k}[0]`),
      '__proto__',
      'constructor',
      'prototype',
      '__proto__[polluted]',
    ),
    fc.string({ minLength: 1, maxLength: 10 }),
  );
  // Keys are drawn with repetition, so ?page=1&page=2 comes up often.
  return fc
    .array(fc.tuple(key, queryValue), { maxLength: 6 })
    .map((pairs) => pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&'));
}

describe('query strings', () => {
  test.concurrent.each(Object.keys(querySchemas))(
    'when %s gets repeated keys, arrays, NaN, Infinity, 1e309 or pollution keys, then invalid ones are 400 in the error shape and valid ones 200',
    async (key) => {
      const schema = querySchemas[key]!;
      const { agent } = await pool.shared('admin');
      const path = key.slice(4);
      const examples: [string][] = [
        ['page=1&page=2'],
        ['page[]=1'],
        ['pageSize=NaN'],
        ['page=Infinity'],
        ['page=1e309'],
        ['__proto__[polluted]=yes'],
        ['constructor=x&prototype=y'],
      ];
      await fc.assert(
        fc.asyncProperty(queryString(Object.keys(schema.shape)), async (qs) => {
          const res = await agent.get(`${path}?${qs}`);
          const valid = schema.safeParse(parseQuery(qs)).success;
          expect(res.status, `${qs}: ${res.text.slice(0, 200)}`).toBe(valid ? 200 : 400);
          if (!valid) expect(res.body).toMatchObject({ error: { code: 'validation_failed' } });
          expectCleanPrototype();
        }),
        { numRuns: RUNS * 2, examples },
      );
    },
  );

  test('when any other GET route gets hostile query strings, then it never answers 5xx', async () => {
    const { agent } = await pool.shared('admin');
    const others = queryRoutes().filter((r) => !(r.key in querySchemas));
    expect(others.length).toBeGreaterThan(0);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...others), queryString(['page', 'q', 'login', 'returnTo', 'format']), async (route, qs) => {
        const res = await agent.get(`${route.path}?${qs}`);
        expect(res.status, `${route.key}?${qs}`).toBeLessThan(500);
      }),
      { numRuns: RUNS * 2 },
    );
  });
});
