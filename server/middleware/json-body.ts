import { isUtf8 } from 'node:buffer';
import express, { type Request, type RequestHandler } from 'express';
import { AppError } from '../errors.ts';
import { noteBodySize } from './large-bodies.ts';

/**
 * JSON must be UTF-8 (RFC 8259); without this check invalid bytes would silently become U+FFFD and be stored. The
 * buffer is the inflated body, so its size is what the large-body limit counts.
 */
function rejectInvalidUtf8(req: Request, _res: unknown, buf: Buffer, encoding: string): void {
  noteBodySize(req, buf.length);
  if (encoding === 'utf-8' && !isUtf8(buf)) throw new AppError(400, 'malformed_json', 'The request body is not valid UTF-8.');
}

/** express.json with a size limit and a UTF-8 check. */
export const jsonBody = (limit: string): RequestHandler => express.json({ limit, verify: rejectInvalidUtf8 });
