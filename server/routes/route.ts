import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import type { Actor } from '@shared/policies.ts';
import { actorOf } from '../middleware/actor.ts';
import { parseRequestPart } from '../middleware/validate.ts';

/** The shared schemas of one route, per part of the request. */
export interface RouteSchemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

type Parsed<S extends RouteSchemas, K extends keyof RouteSchemas> = S[K] extends z.ZodType ? z.output<S[K]> : undefined;

/** What a handler gets: each part as its schema's output, and the signed-in actor (null for a visitor). */
export interface RouteContext<S extends RouteSchemas> {
  params: Parsed<S, 'params'>;
  query: Parsed<S, 'query'>;
  body: Parsed<S, 'body'>;
  actor: Actor | null;
  req: Request;
  res: Response;
}

// Params first, then query, then body: the first part that fails answers the 400.
function contextOf<S extends RouteSchemas>(schemas: S, req: Request, res: Response): RouteContext<S> {
  const part = <K extends keyof RouteSchemas>(k: K) => (schemas[k] ? parseRequestPart(schemas[k], req, k) : undefined) as Parsed<S, K>;
  const params = part('params');
  const query = part('query');
  const body = part('body');
  return { params, query, body, actor: actorOf(req), req, res };
}

/**
 * A route handler with typed input, so tsc checks each schema's output against the service it feeds.
 * Parsing fails with the ZodError the error middleware turns into 400 `validation_failed`.
 */
export function route<S extends RouteSchemas>(schemas: S, handler: (ctx: RouteContext<S>) => Promise<void> | void): RequestHandler {
  return async (req, res) => {
    await handler(contextOf(schemas, req, res));
  };
}

/** The same parsing for a check that must pass before later middleware runs (a permission check ahead of a multipart upload). */
export function guard<S extends RouteSchemas>(schemas: S, check: (ctx: RouteContext<S>) => Promise<unknown>): RequestHandler {
  return async (req, res, next) => {
    await check(contextOf(schemas, req, res));
    next();
  };
}
