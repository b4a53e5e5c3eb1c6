// Small helpers about child processes and pids. A child killed by a signal has `exitCode === null` and
// `signalCode` set, so "has it exited?" always looks at both, and no one waits for an `exit` that already fired.
import { readFileSync, readlinkSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';

/** True while the child process has not exited (by code or by signal). */
export const running = (child) => Boolean(child) && child.exitCode === null && child.signalCode === null;

/** Resolves true once the child has exited (at once when it already has), false after `ms`. */
export function waitExit(child, ms) {
  if (!running(child)) return Promise.resolve(true);
  return new Promise((resolve) => {
    const timer = setTimeout(() => {
      child.off('exit', done);
      resolve(false);
    }, ms);
    function done() {
      clearTimeout(timer);
      resolve(true);
    }
    child.once('exit', done);
  });
}

/** Signal the child, wait up to `graceMs`, then SIGKILL it. Resolves when it is gone. */
export async function stopChild(child, { signal = 'SIGTERM', graceMs = 15_000 } = {}) {
  if (!running(child)) return;
  child.kill(signal);
  if (await waitExit(child, graceMs)) return;
  child.kill('SIGKILL');
  await waitExit(child, 5000);
}

/** True while the pid runs (a zombie, dead but not yet reaped by its parent, counts as gone). */
export function pidAlive(pid) {
  try {
    process.kill(pid, 0);
  } catch (err) {
    return err.code === 'EPERM';
  }
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) !== 'Z';
  } catch {
    return false;
  }
}

/** The process's arguments from /proc (Linux), or null when it is gone. */
export function cmdlineOf(pid) {
  try {
    return readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0').filter(Boolean);
  } catch {
    return null;
  }
}

export function cwdOf(pid) {
  try {
    return readlinkSync(`/proc/${pid}/cwd`);
  } catch {
    return null;
  }
}

/** SIGTERM a pid, wait up to `graceMs` for it to go, then SIGKILL. Resolves true when it is gone. */
export async function killPid(pid, graceMs) {
  try {
    process.kill(pid, 'SIGTERM');
  } catch {
    return true;
  }
  const deadline = Date.now() + graceMs;
  while (Date.now() < deadline) {
    if (!pidAlive(pid)) return true;
    await sleep(100);
  }
  try {
    process.kill(pid, 'SIGKILL');
  } catch {
    /* gone meanwhile */
  }
  for (let i = 0; i < 50 && pidAlive(pid); i++) await sleep(100);
  return !pidAlive(pid);
}
