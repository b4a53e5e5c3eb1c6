// `npm run bench:rig`: a rig posting calibration runs of 10 000 points with a personal API token (no
// cookie, no CSRF), as fast as it can over a few connections, against the real server in its own
// process; the health route is measured in the same run and the ratio printed. Loopback only.
import autocannon from 'autocannon';
import { createSequelize } from '../server/db/sequelize.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { initModels } from '../server/models/index.ts';
import { User } from '../server/models/user.model.ts';
import { Part } from '../server/models/part.model.ts';
import { Build } from '../server/models/build.model.ts';
import { Actuator } from '../server/models/actuator.model.ts';
import { createApiToken } from '../server/services/api-token.service.ts';
import { toActor } from '../server/services/user.service.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';
import { benchConfig, startBenchDb } from './lib/bench-db.ts';
import { startServerProcess } from './lib/bench-server.ts';

const DATABASE = 'scanwright_rig';
const DURATION_S = Number(process.env.BENCH_SECONDS ?? 10);
const POINTS = 10_000;
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 4);

/** Builds to spread the runs over: a build holds at most 100 runs (MAX_BUILD_RUNS). */
const BUILDS = 30;

/** A maker with BUILDS draft builds of one actuator each and a runs:write token (a new maker each run of the bench). */
async function rigFixture(): Promise<{ actuatorIds: number[]; token: string }> {
  const sq = createSequelize(benchConfig(DATABASE).db);
  try {
    await createMigrator(sq).up();
    initModels(sq);
    const stamp = Date.now().toString(36);
    const user = await User.create({
      githubId: `rig-${stamp}`,
      login: `rig-${stamp}`,
      name: 'Bench rig',
      email: null,
      role: 'maker',
    } as never);
    const part = await Part.create({ name: `Bench bender ${stamp}`, category: 'bimorph', status: 'accepted' } as never);
    const actuatorIds: number[] = [];
    for (let i = 0; i < BUILDS; i++) {
      const build = await Build.create({
        ownerId: user.id,
        title: `Bench rig ${stamp} ${i}`,
        instrumentKind: 'force-microscope',
        summary: 'A rig posting runs for the benchmark.',
        status: 'draft',
      } as never);
      actuatorIds.push((await Actuator.create({ buildId: build.id, partId: part.id, axis: 'X', drive: 'single' } as never)).id);
    }
    const { token } = await createApiToken(toActor(user), { name: 'bench rig', scopes: ['runs:write'] });
    return { actuatorIds, token };
  } finally {
    await sq.close();
  }
}

/** A 10 000-point staircase up and down, as a capacitive-sensor rig logs it (nm against V). */
function runBody(): string {
  const points = Array.from({ length: POINTS }, (_, i) => {
    const up = i < POINTS / 2;
    const k = up ? i : POINTS - 1 - i;
    const volts = Number(((k / (POINTS / 2)) * 120).toFixed(3));
    return { volts, displacement: Number((volts * 71.3 + (up ? -4 : 4) + Math.sin(i) * 0.8).toFixed(2)), sweep: up ? 'up' : 'down' };
  });
  return JSON.stringify({ kind: 'points', method: 'capacitive', voltageUnit: 'V', displacementUnit: 'nm', points });
}

interface Figures {
  rps: number;
  p95: number;
  errors: number;
}

type LoadOptions = Parameters<typeof autocannon>[0];

function measure(opts: LoadOptions): Promise<Figures> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const instance = autocannon({ duration: DURATION_S, pipelining: 1, ...opts }, (err, result) => {
      if (err) return reject(err);
      latencies.sort((a, b) => a - b);
      resolve({ rps: result.requests.average, p95: quantileSorted(latencies, 0.95) ?? NaN, errors: result.errors + result.non2xx });
    });
    instance.on('response', (_c: unknown, _s: number, _b: number, ms: number) => latencies.push(ms));
  });
}

const stop = await startBenchDb();
try {
  const { actuatorIds, token } = await rigFixture();
  let turn = 0;
  const body = runBody();
  const server = await startServerProcess(DATABASE);
  try {
    const runs: LoadOptions = {
      url: server.base,
      connections: CONNECTIONS,
      requests: [
        {
          method: 'POST',
          headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
          body,
          // Round-robin over the builds' actuators.
          setupRequest: (req: Record<string, unknown>) => ({
            ...req,
            path: `/api/actuators/${actuatorIds[turn++ % actuatorIds.length]}/runs`,
          }),
        } as NonNullable<LoadOptions['requests']>[number],
      ],
    };
    await measure({ url: `${server.base}/api/health`, connections: 16, duration: 1 });
    const health = await measure({ url: `${server.base}/api/health`, connections: 16 });
    const posted = await measure(runs);
    process.stdout.write(
      `\nbody ${(body.length / 1024).toFixed(0)} KB (${POINTS} points), ${CONNECTIONS} connections, ${DURATION_S} s each\n` +
        `health        ${health.rps.toFixed(0).padStart(7)} req/s  p95 ${health.p95.toFixed(1)} ms  errors ${health.errors}\n` +
        `rig runs      ${posted.rps.toFixed(1).padStart(7)} runs/s p95 ${posted.p95.toFixed(1)} ms  errors ${posted.errors}\n` +
        `ratio runs/s ÷ health req/s: ${(posted.rps / health.rps).toFixed(4)}  (points stored per second: ${(posted.rps * POINTS).toFixed(0)})\n`,
    );
  } finally {
    await server.stop();
  }
} finally {
  await stop();
}
