// The OpenAPI 3.1 document of the API, built from the route table (route-docs.ts) and the shared zod schemas
// through zod 4's own JSON Schema output (draft 2020-12, the dialect OpenAPI 3.1 uses).
import { z } from 'zod';
import { apiErrorBody } from '@shared/schemas/api-error.ts';
import { DATA_LICENCE } from '@shared/data-licence.ts';
import { TOKEN_PREFIX } from '@shared/schemas/api-token.ts';
import { ROUTE_DOCS, ROUTE_TAGS } from './route-docs.ts';
import type { RouteDoc } from './route-doc.ts';

type JsonSchema = Record<string, unknown>;

/** A zod schema as JSON Schema describing what a client sends (defaults optional, coercions as their input). */
export function jsonSchemaOf(schema: z.ZodType): JsonSchema {
  const { $schema: _dialect, ...rest } = z.toJSONSchema(schema, {
    io: 'input',
    target: 'draft-2020-12',
    unrepresentable: 'any',
  }) as JsonSchema;
  return rest;
}

/** `/api/runs/:runId` → `/api/runs/{runId}`. */
export const openApiPath = (path: string) => path.replace(/:(\w+)/g, '{$1}');

const ERROR_TEXT: Record<number, string> = {
  400: 'Bad input (`validation_failed` with the fields, or a code saying why).',
  401: 'Not signed in, or a wrong, malformed or revoked token (`unauthorized`, `invalid_token`).',
  403: 'Not allowed (`forbidden`), outside the token’s scopes (`token_scope`) or a missing CSRF token (`csrf_failed`).',
  404: 'No such thing, or not visible to you (`not_found`).',
  409: 'A conflict: the wrong state, or an Idempotency-Key reused or still running (`idempotency_key_reused`, `idempotency_in_progress`).',
  413: 'Too large (a body, a photo, or a run or build past its point budget).',
  415: 'A file of a kind this route does not take (`unsupported_image`).',
  429: 'Too many requests; wait and retry.',
  503: 'The database is unreachable; retry later.',
  507: 'The server has no room to store the upload right now (`insufficient_storage`); retry later.',
};

function errorStatuses(d: RouteDoc): number[] {
  const s = new Set<number>(d.errors ?? []);
  if (d.params || d.query || d.body || d.multipart || d.idempotent) s.add(400);
  if (d.auth !== 'visitor') s.add(401).add(403);
  if (d.params) s.add(404);
  if (d.idempotent) s.add(409);
  if (d.auth === 'session-or-token') s.add(429);
  return [...s].sort((a, b) => a - b);
}

/** Path or query parameters from an object schema's properties. */
function parametersOf(schema: z.ZodType, where: 'path' | 'query'): JsonSchema[] {
  const js = jsonSchemaOf(schema);
  const props = (js.properties ?? {}) as Record<string, JsonSchema>;
  const required = new Set((js.required ?? []) as string[]);
  return Object.entries(props).map(([name, s]) => ({
    name,
    in: where,
    required: where === 'path' || required.has(name),
    ...(typeof s.description === 'string' ? { description: s.description } : {}),
    schema: s,
  }));
}

function securityOf(d: RouteDoc): Array<Record<string, string[]>> {
  const write = d.method !== 'GET';
  const session: Record<string, string[]> = write ? { sessionCookie: [], csrfHeader: [] } : { sessionCookie: [] };
  if (d.auth === 'visitor') return [{}];
  if (d.auth === 'session') return [session];
  return [session, { bearerToken: d.scope ? [d.scope] : [] }];
}

function multipartSchema(m: NonNullable<RouteDoc['multipart']>): JsonSchema {
  const properties: Record<string, JsonSchema> = {};
  for (const [name, f] of Object.entries(m.fields)) {
    properties[name] =
      f.type === 'binary[]'
        ? { type: 'array', items: { type: 'string', contentMediaType: 'application/octet-stream' }, description: f.description }
        : f.type === 'binary'
          ? { type: 'string', contentMediaType: 'application/octet-stream', description: f.description }
          : f.type === 'string | string[]'
            ? { oneOf: [{ type: 'string' }, { type: 'array', items: { type: 'string' } }], description: f.description }
            : { type: f.type, description: f.description };
  }
  return {
    type: 'object',
    properties,
    required: Object.entries(m.fields)
      .filter(([, f]) => f.required)
      .map(([n]) => n),
  };
}

function operationOf(d: RouteDoc): JsonSchema {
  const parameters: JsonSchema[] = [
    ...(d.params ? parametersOf(d.params, 'path') : []),
    ...(d.query ? parametersOf(d.query, 'query') : []),
    ...(d.idempotent ? [{ $ref: '#/components/parameters/IdempotencyKey' }] : []),
  ];
  const body = d.body
    ? {
        required: true,
        content: { 'application/json': { schema: jsonSchemaOf(d.body), ...(d.example !== undefined ? { example: d.example } : {}) } },
      }
    : d.multipart
      ? { required: true, content: { 'multipart/form-data': { schema: multipartSchema(d.multipart) } } }
      : undefined;
  const ok = d.response;
  const responses: Record<string, JsonSchema> = {
    [String(ok.status)]: {
      description: ok.description,
      ...(ok.status === 204 || ok.status === 302 ? {} : { content: { [ok.contentType ?? 'application/json']: {} } }),
    },
  };
  for (const status of errorStatuses(d)) responses[String(status)] = { $ref: `#/components/responses/Error${status}` };
  return {
    operationId: `${d.method.toLowerCase()}${d.path.replace(/[^A-Za-z0-9]+(\w)?/g, (_m, c: string | undefined) => (c ?? '').toUpperCase())}`,
    summary: d.summary,
    ...(d.description ? { description: d.description } : {}),
    tags: [d.tag],
    'x-scanwright-auth': d.auth,
    security: securityOf(d),
    ...(parameters.length > 0 ? { parameters } : {}),
    ...(body ? { requestBody: body } : {}),
    responses,
  };
}

/** The whole document for a server at `publicUrl`. */
export function buildOpenApiDocument(publicUrl: string, docs: readonly RouteDoc[] = ROUTE_DOCS) {
  const paths: Record<string, Record<string, JsonSchema>> = {};
  for (const d of docs) (paths[openApiPath(d.path)] ??= {})[d.method.toLowerCase()] = operationOf(d);
  const errorResponses = Object.fromEntries(
    Object.entries(ERROR_TEXT).map(([status, description]) => [
      `Error${status}`,
      { description, content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } } },
    ]),
  );
  return {
    openapi: '3.1.1',
    jsonSchemaDialect: 'https://json-schema.org/draft/2020-12/schema',
    info: {
      title: 'Scanwright API',
      version: '1',
      summary: 'Build logs, calibration runs, the parts registry, open data and the workbench of Scanwright.',
      description:
        'JSON in and out. Browsers sign in with GitHub and send the CSRF token from `GET /api/session` as `X-CSRF-Token` on ' +
        `every write. Rigs and scripts use a personal token (\`Authorization: Bearer ${TOKEN_PREFIX}…\`), made on the account ` +
        'page, with no cookie and no CSRF token. Errors are always `{ "error": { "code", "message", "details?" } }`. ' +
        `Measurements are published under ${DATA_LICENCE.name} (${DATA_LICENCE.id}).`,
      license: { name: DATA_LICENCE.name, identifier: DATA_LICENCE.id },
    },
    servers: [{ url: publicUrl.replace(/\/$/, '') }],
    tags: ROUTE_TAGS.map((t) => ({ ...t })),
    paths,
    components: {
      schemas: { Error: jsonSchemaOf(apiErrorBody) },
      responses: errorResponses,
      parameters: {
        IdempotencyKey: {
          name: 'Idempotency-Key',
          in: 'header',
          required: false,
          description:
            '1–255 visible ASCII characters, one per logical request. The same key and body within 24 h replays the first ' +
            'answer (`Idempotent-Replayed: true`) instead of creating again; the key with another body is 409.',
          schema: { type: 'string', minLength: 1, maxLength: 255, pattern: '^[\\x21-\\x7e]+$' },
        },
      },
      securitySchemes: {
        sessionCookie: {
          type: 'apiKey',
          in: 'cookie',
          name: 'scanwright.sid',
          description: 'Browser session after signing in with GitHub.',
        },
        csrfHeader: {
          type: 'apiKey',
          in: 'header',
          name: 'X-CSRF-Token',
          description: 'The `csrfToken` of `GET /api/session`, on every write with a session.',
        },
        bearerToken: {
          type: 'http',
          scheme: 'bearer',
          bearerFormat: `${TOKEN_PREFIX}…`,
          description:
            'A personal rig token from the account page. Scopes: `runs:write` (add and correct runs) and `read` (GETs). ' +
            'No cookie or CSRF token needed; 120 requests a minute per token.',
        },
      },
    },
  };
}
