// One warning when the database stops answering and one info line when it answers again, instead of a
// stack per request in between: the error handler reports each 503 here, and while the outage lasts a
// `SELECT 1` every second notices the database coming back even if no request does.
import type { Sequelize } from 'sequelize';
import type { Logger } from '../logger.ts';

export interface OutageLog {
  /** A request (or the outbox worker) failed because the database is unreachable. */
  noteDown(err: unknown): void;
  close(): void;
}

const POLL_MS = 1000;

/** What the log line keeps of the error: its kind and message, no stack. */
function summary(err: unknown) {
  const e = (err ?? {}) as { name?: string; message?: string; original?: { code?: string }; parent?: { code?: string }; code?: string };
  return { name: e.name, code: e.original?.code ?? e.parent?.code ?? e.code, message: e.message };
}

export function createOutageLog(sequelize: Sequelize, log: Logger): OutageLog {
  let since: number | null = null;
  let failures = 0;
  let timer: NodeJS.Timeout | undefined;
  let closed = false;
  const poll = () => {
    timer = setTimeout(() => {
      sequelize.query('SELECT 1').then(
        () => {
          log.info({ downForMs: Date.now() - since!, failures }, 'database answers again');
          since = null;
          failures = 0;
        },
        () => void (closed || poll()),
      );
    }, POLL_MS);
    timer.unref();
  };
  return {
    noteDown(err) {
      failures++;
      if (since !== null || closed) return;
      since = Date.now();
      log.warn({ cause: summary(err) }, 'database unreachable: answering 503 until it is back');
      poll();
    },
    close() {
      closed = true;
      clearTimeout(timer);
    },
  };
}
