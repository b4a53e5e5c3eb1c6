import type { RequestHandler } from 'express';
import type { z } from 'zod';

type Part = 'body' | 'query' | 'params';

/** Parse one part of the request with a shared zod schema; the parsed value lands in res.locals[part]. */
export function validate<S extends z.ZodType>(schema: S, part: Part = 'body'): RequestHandler {
  return (req, res, next) => {
    const source = part === 'body' ? (req.body ?? {}) : req[part];
    res.locals[part] = schema.parse(source);
    next();
  };
}
