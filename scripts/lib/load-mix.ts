// The mixed read/write load of `npm run bench:load` and `npm run bench:cluster`: autocannon on loopback, one instance
// per route, all at once — the builds index and a build page, the nm/V search and a part page (4 connections each), a
// maker recording calibration runs and sending messages about listings (2 each). It counts rows before and after, so
// an acknowledged write that left no row (or a row nobody acknowledged) shows up as lost.
import autocannon from 'autocannon';
import { Op } from 'sequelize';
import { demoSweep } from '../../server/db/seed/demo-points.ts';
import { Part } from '../../server/models/part.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { Actuator } from '../../server/models/actuator.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Message } from '../../server/models/message.model.ts';
import { User } from '../../server/models/user.model.ts';
import { quantileSorted } from '../../shared/stats/quantiles.ts';
import { seededRandom } from '../../shared/stats/seeded-random.ts';

/** The maker who writes during the load. */
const MAKER = 'bench-maker';

/**
 * Accepted registry parts beyond the demo's, so the nm/V search has rows to sift. The models must be bound to
 * `sequelize` (initModels) before.
 */
export async function addGeneratedParts(count: number, seed = 1): Promise<void> {
  const random = seededRandom(seed);
  const categories = ['bimorph', 'buzzer-disc', 'stack', 'tube'] as const;
  for (let i = 0; i < count; i += 1000) {
    await Part.bulkCreate(
      Array.from({ length: Math.min(1000, count - i) }, (_, k) => {
        const gain = 5 + random() * 300;
        return {
          category: categories[Math.floor(random() * categories.length)],
          name: `Generated part ${i + k}`,
          salvageSource: 'bench generator',
          material: 'PZT-5A',
          lengthMm: 10 + (k % 30),
          widthMm: null,
          thicknessMm: 0.5,
          outerDiameterMm: null,
          wallMm: null,
          layers: null,
          capacitanceNf: 1,
          safeVolts: 60,
          notes: null,
          status: 'accepted' as const,
          proposedById: null,
          acceptedRunCount: 1 + (k % 5),
          buildCount: 1,
          gainMedianNmPerV: gain,
          gainP25NmPerV: gain * 0.95,
          gainP75NmPerV: gain * 1.05,
          gainMinNmPerV: gain * 0.9,
          gainMaxNmPerV: gain * 1.1,
          hysteresisMedianPct: 5,
        };
      }),
    );
  }
}

/** Sign in as `login` through the OAuth stand-in, as a browser would; returns the session cookie and CSRF token. */
async function signIn(origin: string, login: string): Promise<{ cookie: string; csrfToken: string }> {
  const sid = (res: Response) =>
    res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .find((c) => c.startsWith('scanwright.sid='));
  const start = await fetch(`${origin}/auth/github?login=${login}`, { redirect: 'manual' });
  const atProvider = await fetch(start.headers.get('location')!, { redirect: 'manual' });
  const done = await fetch(atProvider.headers.get('location')!, { redirect: 'manual', headers: { cookie: sid(start) ?? '' } });
  const cookie = sid(done);
  const session = (await (await fetch(`${origin}/api/session`, { headers: { cookie: cookie ?? '' } })).json()) as {
    user: { login: string } | null;
    csrfToken: string;
  };
  if (session.user?.login !== login || !cookie) throw new Error(`sign-in failed: ${JSON.stringify(session)}`);
  return { cookie, csrfToken: session.csrfToken };
}

export interface LoadRoute {
  name: string;
  connections: number;
  method: 'GET' | 'POST';
  path: () => string;
  body?: () => string;
  headers?: Record<string, string>;
  /** Rows this route adds, counted before and after the measured window (write routes only). */
  rows?: () => Promise<number>;
}

/** The health route alone, with as many connections as the whole mix: the floor every request stands on. */
export const healthRoute: LoadRoute = { name: 'GET /api/health', connections: 20, method: 'GET', path: () => '/api/health' };

/**
 * Sign the maker in at `origin`, give them four draft builds with one actuator each, and return the mix's routes.
 * The models must be bound to the database the server at `origin` uses.
 */
export async function prepareLoadMix(origin: string, seed = 2): Promise<LoadRoute[]> {
  const random = seededRandom(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(random() * xs.length)];
  const { cookie, csrfToken } = await signIn(origin, MAKER);
  const maker = (await User.findOne({ where: { login: MAKER } }))!;
  const demoPart = await Part.findOne({ where: { status: 'accepted' }, order: [['id', 'ASC']] });
  const actuatorIds: number[] = [];
  for (let i = 0; i < 4; i++) {
    const build = await Build.create({
      ownerId: maker.id,
      title: `Bench build ${i}`,
      instrumentKind: 'profilometer',
      summary: 'Load benchmark.',
      body: '',
      stage: 'working',
      status: 'draft',
    });
    const actuator = await Actuator.create({
      buildId: build.id,
      partId: demoPart!.id,
      label: null,
      axis: 'X',
      drive: 'single',
      amplifier: null,
      maxVolts: 40,
      notes: null,
    });
    actuatorIds.push(actuator.id);
  }
  const listingIds = (
    await Listing.findAll({ where: { status: 'open', hiddenAt: null, ownerId: { [Op.ne]: maker.id } }, attributes: ['id'] })
  ).map((l) => l.id);
  const publishedBuildIds = (await Build.findAll({ where: { status: 'published' }, attributes: ['id'] })).map((b) => b.id);
  const partIds = (await Part.findAll({ where: { status: 'accepted' }, attributes: ['id'] })).map((p) => p.id);
  const points = demoSweep({ gainNmPerV: 90, loopFraction: 0.05, noiseNm: 0.5, maxVolts: 40, steps: 10, unit: 'nm', seed: 7 });
  const runBody = JSON.stringify({ points, voltageUnit: 'V', displacementUnit: 'nm', model: 'intercept', method: 'indicator' });
  const authed = { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
  let message = 0;
  return [
    { name: 'GET /api/builds', connections: 4, method: 'GET', path: () => '/api/builds' },
    { name: 'GET /api/builds/:id', connections: 4, method: 'GET', path: () => `/api/builds/${pick(publishedBuildIds)}` },
    {
      name: 'GET /api/parts?gainMin&gainMax',
      connections: 4,
      method: 'GET',
      path: () => {
        const lo = 10 + Math.floor(random() * 200);
        return `/api/parts?gainMin=${lo}&gainMax=${lo + 40}&sort=-gain`;
      },
    },
    { name: 'GET /api/parts/:id', connections: 4, method: 'GET', path: () => `/api/parts/${pick(partIds)}` },
    {
      name: 'POST /api/actuators/:id/runs',
      connections: 2,
      method: 'POST',
      path: () => `/api/actuators/${pick(actuatorIds)}/runs`,
      body: () => runBody,
      headers: authed,
      rows: () => CalibrationRun.count({ where: { actuatorId: actuatorIds } }),
    },
    {
      name: 'POST /api/listings/:id/messages',
      connections: 2,
      method: 'POST',
      path: () => `/api/listings/${pick(listingIds)}/messages`,
      body: () => JSON.stringify({ body: `Still available? (bench message ${++message})` }),
      headers: authed,
      rows: () => Message.count({ where: { senderId: maker.id } }),
    },
  ];
}

export interface RouteFigures {
  route: LoadRoute;
  sent: number;
  /** Every answered request's latency in ms, ascending. */
  latencies: number[];
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  errors: number;
  non2xx: number;
  statuses: Map<number, number>;
}

/** One autocannon instance on one route for `seconds`. */
export function loadRoute(origin: string, route: LoadRoute, seconds: number): Promise<RouteFigures> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const statuses = new Map<number, number>();
    let sent = 0;
    // setupRequest and timeout are autocannon 9 options the shared type file leaves out.
    const options = {
      url: origin,
      connections: route.connections,
      duration: seconds,
      pipelining: 1,
      timeout: 10,
      requests: [
        {
          method: route.method,
          headers: route.headers,
          setupRequest: (req: Record<string, unknown>) => (
            sent++,
            { ...req, path: route.path(), ...(route.body ? { body: route.body() } : {}) }
          ),
        },
      ],
    };
    const instance = autocannon(options as unknown as Parameters<typeof autocannon>[0], (err, result) => {
      if (err) return reject(err);
      latencies.sort((a, b) => a - b);
      resolve({
        route,
        sent,
        latencies,
        rps: latencies.length / seconds,
        p50: quantileSorted(latencies, 0.5) ?? NaN,
        p95: quantileSorted(latencies, 0.95) ?? NaN,
        p99: quantileSorted(latencies, 0.99) ?? NaN,
        max: latencies[latencies.length - 1] ?? NaN,
        errors: result.errors + result.timeouts,
        non2xx: result.non2xx,
        statuses,
      });
    });
    instance.on('response', (_c: unknown, status: number, _b: number, ms: number) => {
      latencies.push(ms);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    });
  });
}

/** 95th percentile over the requests of several routes together (Hyndman–Fan type 7, as quantileSorted). */
export function p95Of(figures: readonly RouteFigures[]): number {
  const all = figures.flatMap((f) => f.latencies).sort((a, b) => a - b);
  return quantileSorted(all, 0.95) ?? NaN;
}

export interface MixResult {
  seconds: number;
  figures: RouteFigures[];
  /** Per route: 201s, rows added, requests cut off unanswered, writes lost (see `mixTable`). */
  writes: Array<{ created: number; added: number; unanswered: number; lost: number } | null>;
  requests: number;
  rps: number;
  /** Socket errors, timeouts and non-2xx answers over all routes. */
  errors: number;
  lost: number;
}

/** A warm-up of `warmupS`, then every route at once for `measureS`, with the rows before and after. */
export async function runLoadMix(origin: string, routes: LoadRoute[], warmupS: number, measureS: number): Promise<MixResult> {
  await Promise.all(routes.map((r) => loadRoute(origin, r, warmupS)));
  await new Promise((r) => setTimeout(r, 500));
  const before = await Promise.all(routes.map((r) => r.rows?.() ?? 0));
  const figures = await Promise.all(routes.map((r) => loadRoute(origin, r, measureS)));
  await new Promise((r) => setTimeout(r, 1000)); // let requests cut off at the end settle
  const after = await Promise.all(routes.map((r) => r.rows?.() ?? 0));
  let errors = 0;
  let lost = 0;
  const writes = figures.map((f, i) => {
    errors += f.errors + f.non2xx;
    if (!f.route.rows) return null;
    const created = f.statuses.get(201) ?? 0;
    const added = after[i] - before[i];
    // Requests still in flight when the window closed were sent but never answered: they may be stored.
    const unanswered = f.sent - f.latencies.length;
    const routeLost = Math.max(0, created - added) + Math.max(0, added - created - unanswered);
    lost += routeLost;
    return { created, added, unanswered, lost: routeLost };
  });
  const requests = figures.reduce((s, f) => s + f.latencies.length, 0);
  return { seconds: measureS, figures, writes, requests, rps: requests / measureS, errors, lost };
}

/** The per-route table of a mix run. */
export function mixTable(result: MixResult): string[] {
  const pad = (s: string | number, n: number) => String(s).padStart(n);
  const lines = [
    `route                            conns  requests   req/s   p50 ms   p95 ms   p99 ms   max ms  errors  non-2xx   201s  rows+  unanswered  lost`,
  ];
  result.figures.forEach((f, i) => {
    const w = result.writes[i];
    lines.push(
      `${f.route.name.padEnd(32)} ${pad(f.route.connections, 5)} ${pad(f.latencies.length, 9)} ${pad(f.rps.toFixed(0), 7)} ` +
        `${pad(f.p50.toFixed(1), 8)} ${pad(f.p95.toFixed(1), 8)} ${pad(f.p99.toFixed(1), 8)} ` +
        `${pad(f.max.toFixed(0), 8)} ${pad(f.errors, 7)} ${pad(f.non2xx, 8)}` +
        (w ? ` ${pad(w.created, 6)} ${pad(w.added, 6)} ${pad(w.unanswered, 11)} ${pad(w.lost, 5)}` : ''),
    );
    if (f.non2xx) lines.push(`  statuses: ${[...f.statuses].map(([s, n]) => `${s}×${n}`).join(' ')}`);
  });
  const connections = result.figures.reduce((s, f) => s + f.route.connections, 0);
  lines.push(`${'all routes'.padEnd(32)} ${pad(connections, 5)} ${pad(result.requests, 9)} ${pad(result.rps.toFixed(0), 7)}`);
  return lines;
}

/** Server log lines at error level or above (pino ≥ 50), grouped by route and message. */
export function serverErrorSummary(lines: readonly string[]): string[] {
  const kinds = new Map<string, number>();
  for (const l of lines) {
    let e: { msg?: string; err?: { message?: string }; req?: { method?: string; url?: string } };
    try {
      e = JSON.parse(l) as typeof e;
    } catch {
      e = { msg: l.slice(0, 200) };
    }
    const key = `${e.req?.method ?? ''} ${e.req?.url?.replace(/\d+/g, ':id') ?? ''} ${e.msg}: ${(e.err?.message ?? '').split('\n')[0].slice(0, 160)}`;
    kinds.set(key, (kinds.get(key) ?? 0) + 1);
  }
  return [...kinds].map(([k, n]) => `  ${n} × ${k}`);
}

/** Collects the error-level JSON log lines a server prints (after any `[name] ` prefix) into `into`. */
export function collectServerErrors(into: string[]) {
  return (chunk: Buffer | string) => {
    for (const line of chunk.toString().split('\n')) {
      const json = line.slice(line.indexOf('{'));
      if (/"level":(50|60)/.test(json)) into.push(json);
    }
  };
}
