// GET /api/openapi.json: every route of the app is documented (and nothing else), every documented example
// validates against its zod schema and, independently, against the served JSON Schema (ajv, draft 2020-12),
// the document is valid OpenAPI 3.1, and the documented auth and Idempotency-Key support match the server.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { Validator } from '@seriousme/openapi-schema-validator';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { fillPath, listRoutes } from '../support/route-table.ts';
import { ROUTE_DOCS } from '../../server/openapi/route-docs.ts';
import { openApiPath } from '../../server/openapi/openapi-document.ts';
import { createRunInput } from '../../shared/schemas/run.ts';
import { tokenMayRequest } from '../../shared/auth/token-scopes.ts';
import { RIG_RUN_BODY, bodyInExample, rigCurlExample, rigPythonExample } from '../../shared/docs/rig-examples.ts';

type Doc = {
  openapi: string;
  info: { title: string; version: string };
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, unknown>; securitySchemes: Record<string, unknown> };
};
type Operation = {
  requestBody?: { content: Record<string, { schema: unknown; example?: unknown }> };
  responses: Record<string, { $ref?: string }>;
  parameters?: Array<{ $ref?: string; name?: string; in?: string }>;
  security: Array<Record<string, string[]>>;
};

let t: TestApp;
let doc: Doc;
beforeAll(async () => {
  t = await startTestApp();
  const res = await request(t.app).get('/api/openapi.json');
  expect(res.status).toBe(200);
  doc = res.body as Doc;
});
afterAll(async () => {
  await t.close();
});

const ajv = new Ajv2020({ strict: false, validateFormats: false, allErrors: true });
const documentedKeys = () =>
  Object.entries(doc.paths).flatMap(([path, ops]) =>
    Object.keys(ops).map((m) => `${m.toUpperCase()} ${path.replace(/\{(\w+)\}/g, ':$1')}`),
  );
const appKeys = () =>
  listRoutes(t.app)
    .map((r) => r.key)
    .filter((k) => k !== 'GET /{*splat}');

describe('GET /api/openapi.json', () => {
  test('when anyone asks, then it is an OpenAPI 3.1 document, public and cacheable', async () => {
    const res = await request(t.app).get('/api/openapi.json');
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.headers['cache-control']).toBe('public, max-age=300');
    expect(doc.openapi).toMatch(/^3\.1\.\d+$/);
    expect(doc.info).toMatchObject({ title: expect.any(String), version: expect.any(String) });
    expect(Object.keys(doc.components.securitySchemes).sort()).toEqual(['bearerToken', 'csrfHeader', 'sessionCookie']);
  });

  test('when the document is checked against the OpenAPI 3.1 schema, then it is valid', async () => {
    const validator = new Validator();
    const result = await validator.validate(structuredClone(doc) as unknown as Parameters<Validator['validate']>[0]);
    expect(result.errors ?? [], JSON.stringify(result.errors ?? []).slice(0, 2000)).toEqual([]);
    expect(validator.version).toBe('3.1');
    expect(result.valid).toBe(true);
  });

  test('when the app gains or loses a route, then this fails until the route table says so', () => {
    const app = appKeys();
    const documented = documentedKeys();
    expect(
      app.filter((k) => !documented.includes(k)),
      'routes of the app missing from the document',
    ).toEqual([]);
    expect(
      documented.filter((k) => !app.includes(k)),
      'documented routes the app does not have',
    ).toEqual([]);
    expect(new Set(ROUTE_DOCS.map((d) => `${d.method} ${d.path}`)).size).toBe(ROUTE_DOCS.length);
  });

  test('when an operation can fail, then its error answers refer to the one shared error schema', () => {
    const errorSchema = doc.components.schemas.Error as { properties: { error: { required: string[] } } };
    expect(errorSchema.properties.error.required.sort()).toEqual(['code', 'message']);
    for (const [path, ops] of Object.entries(doc.paths))
      for (const [method, op] of Object.entries(ops))
        for (const [status, r] of Object.entries(op.responses))
          if (Number(status) >= 400) expect(r.$ref, `${method} ${path} ${status}`).toBe(`#/components/responses/Error${status}`);
  });
});

describe('documented examples', () => {
  const withExamples = ROUTE_DOCS.filter((d) => d.example !== undefined);

  test('when the table is read, then the main routes carry a request example', () => {
    expect(withExamples.map((d) => `${d.method} ${d.path}`)).toEqual(
      expect.arrayContaining([
        'POST /api/actuators/:actuatorId/runs',
        'PATCH /api/runs/:runId',
        'POST /api/builds',
        'POST /api/account/tokens',
      ]),
    );
  });

  test.each(withExamples.map((d) => [`${d.method} ${d.path}`, d] as const))(
    'when the example of %s is checked, then its zod schema and the served JSON Schema both accept it',
    (_key, d) => {
      const parsed = d.body!.safeParse(d.example);
      expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
      const op = doc.paths[openApiPath(d.path)]![d.method.toLowerCase()]!;
      const media = op.requestBody!.content['application/json']!;
      expect(media.example).toEqual(d.example);
      const validate = ajv.compile(media.schema as object);
      expect(validate(structuredClone(d.example)), JSON.stringify(validate.errors)).toBe(true);
    },
  );

  test('when the rig examples of the reference page are read, then the body in the curl command and in the Python script is the run example and validates', () => {
    const schema = doc.paths['/api/actuators/{actuatorId}/runs']!.post!.requestBody!.content['application/json']!.schema as object;
    const validate = ajv.compile(schema);
    for (const text of [rigCurlExample('https://example.org'), rigPythonExample('https://example.org')]) {
      const body = bodyInExample(text);
      expect(body).toEqual(RIG_RUN_BODY);
      expect(createRunInput.safeParse(body).success).toBe(true);
      expect(validate(body), JSON.stringify(validate.errors)).toBe(true);
    }
    expect(rigPythonExample('https://example.org')).toMatch(/^import urllib\.request$/m);
    expect(rigPythonExample('https://example.org')).not.toMatch(/^import requests$/m);
    expect(rigCurlExample('https://example.org')).toContain('Idempotency-Key');
  });

  test('when a JSON Schema check meets a broken body, then it refuses it (the check is not vacuous)', () => {
    const schema = doc.paths['/api/actuators/{actuatorId}/runs']!.post!.requestBody!.content['application/json']!.schema as object;
    const validate = ajv.compile(schema);
    expect(validate({ ...RIG_RUN_BODY, method: 'guess' })).toBe(false);
    expect(validate({ ...RIG_RUN_BODY, points: RIG_RUN_BODY.points.slice(0, 2) })).toBe(false);
  });
});

describe('documented auth and Idempotency-Key', () => {
  let maker: Agent;
  beforeAll(async () => {
    maker = await signIn(t, (await createUser()).login);
  });

  test('when a route is documented as session-or-token, then a token with all scopes reaches it, and only then', () => {
    const allScopes = ['runs:write', 'read'] as const;
    for (const d of ROUTE_DOCS.filter((r) => r.auth !== 'visitor')) {
      const path = fillPath(d.path, Object.fromEntries([...d.path.matchAll(/:(\w+)/g)].map((m) => [m[1]!, 1])));
      expect(tokenMayRequest(allScopes, d.method, path), `${d.method} ${d.path} is ${d.auth}`).toBe(d.auth === 'session-or-token');
      if (d.scope) expect(tokenMayRequest([d.scope], d.method, path), `${d.method} ${d.path} scope ${d.scope}`).toBe(true);
    }
  });

  test('when a POST gets a malformed Idempotency-Key, then it is refused exactly on the routes documented as honouring the key', async () => {
    const posts = ROUTE_DOCS.filter((d) => d.method === 'POST' && d.path.startsWith('/api/') && !d.path.startsWith('/api/workbench/'));
    for (const d of posts) {
      const path = fillPath(d.path, Object.fromEntries([...d.path.matchAll(/:(\w+)/g)].map((m) => [m[1]!, 999999999])));
      const res = await maker.post(path).set('X-CSRF-Token', maker.csrf).set('Idempotency-Key', 'not a key').send({});
      const honoured = res.status === 400 && res.body.error?.code === 'invalid_idempotency_key';
      expect(honoured, `${d.method} ${d.path}: ${res.status} ${res.text.slice(0, 200)}`).toBe(d.idempotent === true);
      const op = doc.paths[openApiPath(d.path)]!.post!;
      expect((op.parameters ?? []).some((p) => p.$ref === '#/components/parameters/IdempotencyKey')).toBe(d.idempotent === true);
    }
  });
});
