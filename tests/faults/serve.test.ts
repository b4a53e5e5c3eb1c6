// `npm run serve` started the way docs/deploy/scanwright.service starts it (scripts/check-serve.mjs):
// the unit's environment against a throwaway MariaDB, /api/health 200, then SIGTERM and exit 0.
import { spawn } from 'node:child_process';
import { expect, test } from 'vitest';

test('when the app is started as the systemd unit does and then gets SIGTERM, then it answered /api/health and exits 0', async () => {
  const r = await new Promise<{ code: number | null; out: string }>((resolve) => {
    const child = spawn(process.execPath, ['scripts/check-serve.mjs'], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (c) => (out += c));
    child.stderr.on('data', (c) => (out += c));
    child.on('exit', (code) => resolve({ code, out }));
  });
  const lines = r.out.split('\n').filter((l) => l.startsWith('[check-serve]'));
  console.log(`[measured] ${lines.filter((l) => /after|exit 0/.test(l)).join(' | ')}`);
  expect([r.code, r.out.slice(-1500)]).toEqual([0, expect.stringContaining('[check-serve] OK')]);
  expect(r.out).toMatch(/\/api\/health 200 after \d+ ms/);
  expect(r.out).toMatch(/exit 0, \d+ ms after SIGTERM/);
}, 85_000);
