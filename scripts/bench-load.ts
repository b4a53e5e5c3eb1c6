// `npm run bench:load`: a mixed read/write load (scripts/lib/load-mix.ts) on the real server process
// (`server/index.ts`), against a throwaway MariaDB on tmpfs seeded with the demo scenario plus generated parts
// (scripts/lib/bench-single.ts). About 60 s in all by default (BENCH_SECONDS sets the measured part, 40 by default).
// Rate limits are off. Prints throughput and latency per route, errors, and lost writes (201s vs rows that appeared).
import { freePort } from './lib/scratch.mjs';
import { startSingleShape, type SingleShape } from './lib/bench-single.ts';
import { addGeneratedParts, mixTable, prepareLoadMix, runLoadMix, serverErrorSummary } from './lib/load-mix.ts';

const MEASURE_S = Number(process.env.BENCH_SECONDS ?? 40);
const WARMUP_S = Math.max(1, Math.min(3, Math.round(MEASURE_S / 10)));
const GENERATED_PARTS = Number(process.env.BENCH_PARTS ?? 3000);
const t0 = Date.now();
const say = (s: string) => process.stdout.write(`[${((Date.now() - t0) / 1000).toFixed(1).padStart(5)} s] ${s}\n`);

let single: SingleShape | null = null;
process.on('SIGINT', () => void (single?.stop() ?? Promise.resolve()).then(() => process.exit(130)));

try {
  const ports = { db: await freePort(), app: await freePort(), oauth: await freePort(), smtp: await freePort(), inbox: await freePort() };
  single = await startSingleShape(ports, 'tsx');
  say(`MariaDB on :${single.dbPort} (${single.dir}), migrated, demo seeded; server on ${single.origin}`);
  await addGeneratedParts(GENERATED_PARTS);
  say(`${GENERATED_PARTS} generated parts (DB_POOL_MAX ${process.env.DB_POOL_MAX ?? 10})`);
  const routes = await prepareLoadMix(single.origin);
  say(
    `warm-up ${WARMUP_S} s, then measuring ${MEASURE_S} s, ${routes.reduce((n, r) => n + r.connections, 0)} connections over ${routes.length} routes`,
  );
  const result = await runLoadMix(single.origin, routes, WARMUP_S, MEASURE_S);
  const ok = result.errors === 0 && result.lost === 0;
  const lines = [
    '',
    ...mixTable(result),
    '',
    `errors (socket errors, timeouts, non-2xx): ${result.errors}   lost writes: ${result.lost}   ${ok ? 'OK' : 'FAILED'}`,
    'lost = 201s without a new row, or new rows beyond 201s + unanswered (requests cut off when the window closed).',
  ];
  if (single.serverErrors.length) lines.push('', 'server errors logged:', ...serverErrorSummary(single.serverErrors));
  process.stdout.write(`${lines.join('\n')}\n`);
  process.exitCode = ok ? 0 : 1;
} catch (err) {
  process.stderr.write(`${err instanceof Error ? `${err.message}\n${err.stack}` : err}\n`);
  process.exitCode = 1;
} finally {
  await single?.stop();
  say('done');
}
// stopServer's 30 s SIGKILL fallback timer stays pending after a clean stop; do not wait for it.
process.exit(process.exitCode ?? 0);
