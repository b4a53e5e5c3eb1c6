import type { Request } from 'express';
import type { z } from 'zod';

/** The parts of a request a shared schema can describe. */
export type RequestPart = 'body' | 'query' | 'params';

/** Parse one part of the request with a shared zod schema; the ZodError it throws becomes 400 `validation_failed`. */
export function parseRequestPart<S extends z.ZodType>(schema: S, req: Request, part: RequestPart): z.output<S> {
  return schema.parse(part === 'body' ? (req.body ?? {}) : req[part]);
}
