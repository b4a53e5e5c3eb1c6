// Keeps one child process running: when it dies it is started again after a delay that doubles from
// 0.5 s up to 30 s (SUPERVISOR_MAX_DELAY_MS), and the delay starts over once the child has run 60 s. At the
// 10th failure in a row (SUPERVISOR_MAX_FAILURES; failures that did not last 60 s), it is not restarted
// again and `onGiveUp` is called. `decide` may say a given exit is final.
import { running } from './processes.mjs';

/** A positive whole number from the environment, else `fallback`. */
const fromEnv = (name, fallback) => {
  const v = Number(process.env[name]);
  return Number.isInteger(v) && v > 0 ? v : fallback;
};

export const BACKOFF = {
  firstMs: 500,
  maxMs: fromEnv('SUPERVISOR_MAX_DELAY_MS', 30_000),
  healthyMs: 60_000,
  maxFailures: fromEnv('SUPERVISOR_MAX_FAILURES', 10),
};

/**
 * @param {object} o
 * @param {string} o.name                      for the log lines
 * @param {() => Promise<import('node:child_process').ChildProcess>} o.start  spawn it (resolves once started)
 * @param {() => boolean} o.stopping           true once the whole stack is stopping: no more restarts
 * @param {(exit: { code: number | null, signal: string | null, upMs: number }) => 'restart' | 'final'} [o.decide]
 * @param {(exit: { code: number | null, signal: string | null }) => void} [o.onFinal]
 * @param {() => void} o.onGiveUp
 * @param {(line: string) => void} o.log
 */
export function supervise({ name, start, stopping, decide = () => 'restart', onFinal = () => {}, onGiveUp, log, backoff = BACKOFF }) {
  let child = null;
  let startedAt = 0;
  let delay = backoff.firstMs;
  let failuresInARow = 0;
  let timer = null;
  const restarts = [];

  async function launch() {
    timer = null;
    if (stopping()) return;
    try {
      child = await start();
    } catch (err) {
      log(`${name} did not start: ${err instanceof Error ? err.message.split('\n')[0] : err}`);
      child = null;
      return scheduleRestart();
    }
    startedAt = Date.now();
    const mine = child;
    mine.once('exit', (code, signal) => {
      if (child !== mine) return;
      onExit(code, signal);
    });
    if (!running(mine)) onExit(mine.exitCode, mine.signalCode);
  }

  function onExit(code, signal) {
    if (stopping()) return;
    const upMs = Date.now() - startedAt;
    if (decide({ code, signal, upMs }) === 'final') return onFinal({ code, signal });
    log(`${name} ${signal ? `was killed by ${signal}` : `exited with code ${code}`} after ${(upMs / 1000).toFixed(1)} s`);
    if (upMs >= backoff.healthyMs) {
      delay = backoff.firstMs;
      failuresInARow = 0;
    }
    scheduleRestart();
  }

  function scheduleRestart() {
    if (stopping()) return;
    failuresInARow += 1;
    if (failuresInARow >= backoff.maxFailures) {
      log(`${name} failed ${failuresInARow} times in a row; giving up.`);
      return onGiveUp();
    }
    log(`restarting ${name} in ${(delay / 1000).toFixed(1)} s`);
    restarts.push(Date.now());
    timer = setTimeout(launch, delay);
    delay = Math.min(delay * 2, backoff.maxMs);
  }

  return {
    /** The first start; a failure here is the caller's to handle (it throws). */
    async first() {
      child = await start();
      startedAt = Date.now();
      const mine = child;
      mine.once('exit', (code, signal) => {
        if (child === mine) onExit(code, signal);
      });
      return child;
    },
    current: () => child,
    /** No restart from now on (a pending one is cancelled). */
    cancel() {
      if (timer) clearTimeout(timer);
      timer = null;
    },
    restarts: () => restarts.length,
  };
}
