import { Router } from 'express';
import type { Config } from '../config.ts';
import { buildOpenApiDocument } from '../openapi/openapi-document.ts';
import { route } from './route.ts';

/** GET /api/openapi.json: the OpenAPI 3.1 document, built once from the route table and the shared schemas. */
export function openApiRoutes(config: Config): Router {
  const r = Router();
  let body: string | null = null;
  r.get(
    '/api/openapi.json',
    route({}, ({ res }) => {
      body ??= JSON.stringify(buildOpenApiDocument(config.publicUrl));
      res.set('Cache-Control', 'public, max-age=300').type('application/json; charset=utf-8').send(body);
    }),
  );
  return r;
}
