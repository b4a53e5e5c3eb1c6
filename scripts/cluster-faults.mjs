// `npm run cluster:faults`: does losing a node lose anything? Starts the cluster (scripts/cluster.mjs, its own data
// under .data/faults/), signs in a few makers through the proxy and runs a bounded mixed write load for about 60 s —
// new builds, and messages to a listing owner (each queues one e-mail). Meanwhile it SIGKILLs the Galera node that
// takes the writes and, later, one app instance; the cluster's supervisor restarts both. Then it waits until all
// three nodes are Synced and both instances ready, waits for the mail to go out, and checks that every acknowledged
// write is on every node exactly once and that no mail arrived twice. Prints
//   cluster faults: acknowledged N, lost L, duplicated D, outage S s, mail duplicated M
// and exits 1 when L, D or M is not 0 or the longest all-errors outage S is over 5 s.
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { randomBytes } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { NODES, nodeSql, nodeState } from './lib/galera.mjs';
import { CLUSTER_PORTS, startClusterChild } from './lib/cluster-run.mjs';

const log = (line) => process.stdout.write(`[faults] ${line}\n`);
const WEB = `http://127.0.0.1:${CLUSTER_PORTS.web}`;
const APPS = CLUSTER_PORTS.apps;
const INBOX = `http://127.0.0.1:${CLUSTER_PORTS.inbox}`;
const LOAD_S = Number(process.env.FAULTS_LOAD_S ?? 60);
const WORKERS = 4;
/** Messages per maker: under the limit of 20 per 10 minutes, and all mail fits the catcher's 500. */
const MESSAGES_PER_WORKER = 15;
const MAX_OUTAGE_S = 5;
const dataDir = resolve(process.env.SCANWRIGHT_DATA_DIR ?? '.data/faults');
const root = join(dataDir, 'cluster');
const run = randomBytes(3).toString('hex');

// 1. The cluster, as a child; its supervisor restarts what we kill. A short outbox lease, so that a mail claimed by
// the killed instance is taken over (and would be sent twice, if the claim were not honest) within this run.
const cluster = startClusterChild({
  dataDir,
  env: { SCANWRIGHT_SKIP_CLIENT_BUILD: '1', OUTBOX_LEASE_S: '10', LOG_LEVEL: 'error' },
  onOutput: (c) => {
    for (const line of c.toString().split('\n')) if (/^\[cluster\]/.test(line)) process.stdout.write(`${line}\n`);
  },
});
const stopCluster = () => cluster.stop();
for (const sig of ['SIGINT', 'SIGTERM'])
  process.on(sig, async () => {
    await stopCluster();
    process.exit(130);
  });

/** A cookie-keeping client of the proxy. */
function client() {
  const jar = new Map();
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const keep = (res) => {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const at = pair.indexOf('=');
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
    return res;
  };
  return {
    csrf: '',
    fetch: (url, init = {}) =>
      fetch(url.startsWith('http') ? url : `${WEB}${url}`, {
        redirect: 'manual',
        signal: AbortSignal.timeout(10_000),
        ...init,
        headers: { ...(init.headers ?? {}), cookie: cookie() },
      }).then(keep),
  };
}

/** Sign in through the OAuth stand-in, as GitHub's flow goes: start → provider → callback → session. */
async function signIn(login) {
  const c = client();
  const start = await c.fetch(`/auth/github?login=${login}`);
  const atProvider = await fetch(start.headers.get('location'), { redirect: 'manual' });
  const callback = new URL(atProvider.headers.get('location'));
  const done = await c.fetch(`${callback.pathname}${callback.search}`);
  if (done.status !== 302) throw new Error(`sign-in of ${login} ended with ${done.status}`);
  const session = await (await c.fetch('/api/session')).json();
  if (session.user?.login !== login) throw new Error(`signed in as ${JSON.stringify(session.user)}`);
  c.csrf = session.csrfToken;
  return c;
}

const postJson = (c, path, body) =>
  c.fetch(path, { method: 'POST', headers: { 'content-type': 'application/json', 'x-csrf-token': c.csrf }, body: JSON.stringify(body) });

const pids = () => JSON.parse(readFileSync(join(root, 'pids.json'), 'utf8'));

let status;
try {
  await cluster.ready;
  const listing = (await (await fetch(`${WEB}/api/listings`)).json()).items?.[0];
  if (!listing) throw new Error('the demo has no listing to write to');
  const makers = [];
  for (let w = 0; w < WORKERS; w++) makers.push(await signIn(`faults-${run}-${w}`));
  log(`${WORKERS} makers signed in; ${LOAD_S} s of writes (builds, and messages about listing ${listing.id}) begin`);

  // 2. The load, with the two kills. Every answer is put on the timeline; 201s are the acknowledged writes.
  const acked = { builds: [], messages: [] };
  const timeline = [];
  const started = Date.now();
  const endAt = started + LOAD_S * 1000;
  const faults = [];
  const killAt = async (atS, what, pid) => {
    await sleep(Math.max(0, started + atS * 1000 - Date.now()));
    const p = pid();
    process.kill(p, 'SIGKILL');
    faults.push(`${what} (pid ${p}) killed at ${((Date.now() - started) / 1000).toFixed(1)} s`);
    log(faults.at(-1));
  };
  const kills = Promise.all([
    // Node 1 takes every write while it is up (the others are the proxy's standbys): the worst node to lose.
    killAt(LOAD_S * 0.25, 'Galera node 1', () => pids().nodes['1']),
    killAt(LOAD_S * 0.55, `app instance :${APPS[0]}`, () => pids().apps[String(APPS[0])]),
  ]);
  await Promise.all(
    makers.map(async (c, w) => {
      let n = 0;
      let messages = 0;
      while (Date.now() < endAt) {
        const marker = `faults-${run}-${w}-${n++}`;
        const asMessage = n % 4 === 0 && messages < MESSAGES_PER_WORKER;
        const t0 = Date.now();
        let ok = false;
        try {
          const res = asMessage
            ? await postJson(c, `/api/listings/${listing.id}/messages`, { body: `Is it still there? ${marker}` })
            : await postJson(c, '/api/builds', { title: marker, instrumentKind: 'profilometer', summary: 'Written by the fault run.' });
          await res.arrayBuffer();
          ok = res.status === 201;
          if (ok) (asMessage ? acked.messages : acked.builds).push(marker);
        } catch {
          /* a timeout or a cut connection: not acknowledged */
        }
        if (asMessage) messages++;
        timeline.push({ t: Date.now(), ok, ms: Date.now() - t0 });
        await sleep(40);
      }
    }),
  );
  await kills;
  const failed = timeline.filter((e) => !e.ok).length;
  log(`load done: ${timeline.length} requests, ${failed} not acknowledged`);

  // Longest stretch in which requests were answered and none was acknowledged: from the last success before a
  // failure to the next success.
  timeline.sort((a, b) => a.t - b.t);
  let outageMs = 0;
  let lastOk = started;
  let failedSince = false;
  for (const e of timeline) {
    if (e.ok) {
      if (failedSince) outageMs = Math.max(outageMs, e.t - lastOk);
      lastOk = e.t;
      failedSince = false;
    } else failedSince = true;
  }
  if (failedSince) outageMs = Math.max(outageMs, timeline.at(-1).t - lastOk);

  // 3. Rejoin: every node Synced in a cluster of three, both instances ready.
  const rejoinStart = Date.now();
  for (;;) {
    const states = NODES.map((i) => nodeState(root, i));
    const apps = await Promise.all(
      APPS.map((p) =>
        fetch(`http://127.0.0.1:${p}/api/ready`, { signal: AbortSignal.timeout(2000) }).then(
          (r) => r.ok,
          () => false,
        ),
      ),
    );
    if (states.every((s) => s.synced && s.size === 3) && apps.every(Boolean)) break;
    if (Date.now() - rejoinStart > 180_000) throw new Error(`no full rejoin within 180 s: ${JSON.stringify({ states, apps })}`);
    await sleep(500);
  }
  log(`all three nodes Synced and both instances ready ${((Date.now() - rejoinStart) / 1000).toFixed(1)} s after the load`);

  // 4. The mail of acknowledged messages goes out (a claim of the killed instance expires after 10 s).
  const like = `%faults-${run}-%`;
  const mailDeadline = Date.now() + 90_000;
  let unsent = 0;
  for (;;) {
    unsent = Number(
      nodeSql(root, 2, `SELECT COUNT(*) FROM scanwright.mail_outbox WHERE sent_at IS NULL AND text_body LIKE '${like}'`).trim(),
    );
    if (unsent === 0 || Date.now() > mailDeadline) break;
    await sleep(1000);
  }
  await sleep(1000);
  const caught = await (await fetch(`${INBOX}/api/messages`)).json();
  const mails = new Map();
  for (const m of caught) {
    const marker = /faults-[0-9a-f]{6}-\d+-\d+/.exec(m.text)?.[0];
    if (marker?.includes(`-${run}-`)) mails.set(marker, (mails.get(marker) ?? 0) + 1);
  }
  const mailDuplicated = [...mails.values()].filter((n) => n > 1).length;
  const mailMissing = acked.messages.filter((m) => !mails.has(m)).length;

  // 5. Every acknowledged write on every node, exactly once.
  let lost = 0;
  let duplicated = 0;
  const ackedAll = [...acked.builds, ...acked.messages];
  for (const i of NODES) {
    const rows = [
      ...nodeSql(root, i, `SELECT title, COUNT(*) FROM scanwright.builds WHERE title LIKE '${like}' GROUP BY title`).trim().split('\n'),
      ...nodeSql(
        root,
        i,
        `SELECT SUBSTRING_INDEX(body, ' ', -1), COUNT(*) FROM scanwright.messages WHERE body LIKE '${like}' GROUP BY body`,
      )
        .trim()
        .split('\n'),
    ].filter(Boolean);
    const counts = new Map(rows.map((r) => r.split('\t')).map(([m, n]) => [m, Number(n)]));
    const nodeLost = ackedAll.filter((m) => !counts.has(m)).length;
    const nodeDup = [...counts.values()].filter((n) => n > 1).length;
    log(`node ${i}: ${counts.size} of this run's writes (acknowledged or not), ${nodeLost} acknowledged missing, ${nodeDup} twice or more`);
    lost = Math.max(lost, nodeLost);
    duplicated = Math.max(duplicated, nodeDup);
  }
  const outageS = outageMs / 1000;
  log(
    `mail: ${mails.size} of ${acked.messages.length} acknowledged messages mailed (${mailMissing} not yet, ${unsent} unsent in the outbox)`,
  );
  process.stdout.write(
    `cluster faults: acknowledged ${ackedAll.length}, lost ${lost}, duplicated ${duplicated}, outage ${outageS.toFixed(1)} s, mail duplicated ${mailDuplicated}\n`,
  );
  status = lost || duplicated || mailDuplicated || outageS > MAX_OUTAGE_S ? 1 : 0;
} catch (err) {
  console.error(`cluster faults: ${err instanceof Error ? err.message : err}`);
  status = 1;
} finally {
  await stopCluster();
}
process.exit(status);
