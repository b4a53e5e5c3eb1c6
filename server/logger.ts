import { pino, type Logger } from 'pino';

/** Structured JSON logs; one logger per process, children per request. */
export function createLogger(level: string): Logger {
  return pino({ level, base: { app: 'scanwright' }, redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]'] });
}
export type { Logger };
