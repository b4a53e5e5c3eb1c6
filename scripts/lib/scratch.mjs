// Scratch room for throwaway servers (tests, benchmarks, the test runner): a free loopback port, and a folder for
// database files in memory when the machine has one.
import { accessSync, constants } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';

/** A loopback port nothing listens on right now. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

/** A scratch folder for database files: /dev/shm (memory) when writable, else the system temp folder. */
export function scratchBase() {
  try {
    accessSync('/dev/shm', constants.W_OK);
    return '/dev/shm';
  } catch {
    return tmpdir();
  }
}
