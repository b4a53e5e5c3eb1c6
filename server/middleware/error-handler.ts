import { STATUS_CODES } from 'node:http';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { BaseError, ConnectionError, UniqueConstraintError, TimeoutError, ForeignKeyConstraintError } from 'sequelize';
import { AppError, InsufficientStorageError } from '../errors.ts';
import { isNoSpace } from '../ops/disk-space.ts';

/** At most this many field issues go back in `details`. */
const MAX_DETAILS = 50;

const body = (code: string, message: string, details?: unknown) => ({
  error: details === undefined ? { code, message } : { code, message, details },
});

/** Unknown /api and /auth paths answer 404 in the error shape. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body('not_found', `No route for ${req.method} ${req.path}`));
};

/** The database could not be reached (refused, timed out, connection lost), as opposed to a query that failed. */
export function isDbDown(err: unknown): boolean {
  if (err instanceof ConnectionError || err instanceof TimeoutError) return true;
  type Coded = { code?: string; sqlState?: string; errno?: number; fatal?: boolean };
  const e = err as { name?: string; original?: Coded; parent?: Coded } & Coded;
  const code = e?.original?.code ?? e?.parent?.code ?? e?.code ?? '';
  const sqlState = e?.original?.sqlState ?? e?.parent?.sqlState ?? e?.sqlState ?? '';
  const errno = e?.original?.errno ?? e?.parent?.errno ?? e?.errno;
  // The mariadb driver marks an error `fatal` when it has ended the connection (the socket closed, the server went away
  // mid-statement): whatever its code, the database is not reachable on that connection.
  const fatal = e?.original?.fatal ?? e?.parent?.fatal ?? e?.fatal;
  // SQLSTATE class 08 is "connection exception" (SQL standard); the codes are the driver's and Node's. A server that
  // is shutting down also kills the statements it is running or holding on a lock: 1053 ER_SERVER_SHUTDOWN,
  // 1317 ER_QUERY_INTERRUPTED, 1927 ER_CONNECTION_KILLED [S: MariaDB Server error codes reference].
  return (
    /ECONNREFUSED|ER_GET_CONNECTION_TIMEOUT|ER_CONNECTION_TIMEOUT|ER_SOCKET_UNEXPECTED_CLOSE|ECONNRESET|PROTOCOL_CONNECTION_LOST|ER_CONNECTION_ALREADY_CLOSED|ER_CMD_CONNECTION_CLOSED|ER_POOL_ALREADY_CLOSED|ER_SERVER_SHUTDOWN|ER_QUERY_INTERRUPTED|ER_CONNECTION_KILLED/.test(
      code,
    ) ||
    fatal === true ||
    errno === 1053 ||
    errno === 1317 ||
    errno === 1927 ||
    sqlState.startsWith('08') ||
    e?.name === 'SequelizeConnectionAcquireTimeoutError'
  );
}

/**
 * One error middleware, registered last: every failure leaves as `{ error: { code, message, details? } }`.
 * A 503 for an unreachable database goes to `onDbDown` (logged once per outage) and its access line
 * carries no error object (`res.locals.dbDown`, read by app.ts's request logger).
 */
export function errorHandler(showStack: boolean, opts: { onDbDown?: (err: unknown) => void } = {}): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return void req.socket.destroy();
    if (err instanceof AppError) return void res.status(err.status).json(body(err.code, err.message, err.details));
    if (err instanceof ZodError) {
      // The first issues are enough to fix a form; all of them would let a 4 MB body of bad items become a 30 MB answer.
      const details = err.issues
        .slice(0, MAX_DETAILS)
        .map((i) => ({ path: i.path.map(String).join('.'), message: i.message, code: i.code }));
      const first = details[0];
      return void res
        .status(400)
        .json(body('validation_failed', first ? `${first.path || 'input'}: ${first.message}` : 'Invalid input.', details));
    }
    const status = (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
    const type = (err as { type?: string }).type;
    if (type === 'entity.parse.failed') return void res.status(400).json(body('malformed_json', 'The request body is not valid JSON.'));
    if (type === 'entity.too.large') return void res.status(413).json(body('payload_too_large', 'The request body is too large.'));
    if (type === 'encoding.unsupported' || type === 'charset.unsupported')
      return void res.status(415).json(body('unsupported_encoding', 'Unsupported body encoding.'));
    // A library's 4xx (the static file servers, the body parser): a missing file is not_found, and a message that
    // carries a file-system error (ENOENT … '/srv/…/uploads/x.webp') is replaced by the status's own words.
    if (status === 404) return void res.status(404).json(body('not_found', 'Not found.'));
    if (status === 403) return void res.status(403).json(body('forbidden', 'Forbidden.'));
    if (status && status >= 400 && status < 500) {
      const message = (err as Error).message || '';
      const leaks = typeof (err as { code?: unknown }).code === 'string' || /[\\/]/.test(message);
      return void res.status(status).json(body('bad_request', leaks || !message ? (STATUS_CODES[status] ?? 'Bad request.') : message));
    }
    if (err instanceof UniqueConstraintError) return void res.status(409).json(body('conflict', 'That already exists.'));
    if (err instanceof ForeignKeyConstraintError)
      return void res.status(409).json(body('conflict', 'A referenced record does not exist or is still in use.'));
    if (isNoSpace(err)) {
      const e = new InsufficientStorageError();
      return void res.status(e.status).json(body(e.code, e.message));
    }
    if (isDbDown(err)) {
      opts.onDbDown?.(err);
      res.locals.dbDown = true;
      return void res.status(503).json(body('db_unavailable', 'The database is not reachable; try again shortly.'));
    }
    req.log?.error({ err }, 'unhandled error');
    const message = showStack && err instanceof Error ? `${err.message}\n${err.stack}` : 'Something went wrong on our side.';
    if (err instanceof BaseError) return void res.status(500).json(body('internal_error', showStack ? err.message : message));
    res.status(500).json(body('internal_error', message));
  };
}
