// `npm run db:restore` while the app serves a bounded write load, and `npm run db:verify` on a fresh and
// on tampered archives. What "loses nothing it acknowledged" means for a restore, which rolls the data
// back to the backup on purpose:
//   - every write acknowledged before the backup started is there afterwards;
//   - every write acknowledged and missing afterwards was sent before the fence could be seen (the flag plus
//     the app's one-second look, 1.5 s): it committed to the data the restore replaces, and is in the
//     pre-restore archive; writes arriving later are refused with 503 `maintenance` until the switch, so none
//     acknowledged in the fenced window is lost, and every write acknowledged after the switch stays;
//   - no answer is a 5xx other than 503, reads keep answering 200, and no mail is delivered twice.
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { request as httpRequest, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { waitFor } from '../support/wait-for.ts';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { keepAliveAgent } from '../support/keep-alive-agent.ts';
import { OutboxMail } from '../../server/models/outbox-mail.model.ts';

interface Outcome {
  what: string;
  status: number;
  body: { id?: number; title?: string; error?: { code?: string } } | null;
  retryAfter?: string;
  startedAt: number;
  at: number;
}
interface Who {
  cookie: string;
  csrf: string;
}

let db: PrivateMariaDb;
let t: TestApp;
let server: Server;
let port: number;
let backups: string;
const agent = keepAliveAgent(16);
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

function call(what: string, path: string, opts: { method?: string; as?: Who; json?: unknown } = {}): Promise<Outcome> {
  const startedAt = Date.now();
  const payload = opts.json === undefined ? undefined : JSON.stringify(opts.json);
  const headers: Record<string, string> = { accept: 'application/json' };
  if (opts.as) Object.assign(headers, { cookie: opts.as.cookie, 'x-csrf-token': opts.as.csrf, origin: 'http://127.0.0.1:3999' });
  if (payload) Object.assign(headers, { 'content-type': 'application/json', 'content-length': String(Buffer.byteLength(payload)) });
  return new Promise((resolve) => {
    const req = httpRequest({ host: '127.0.0.1', port, path, method: opts.method ?? 'GET', headers, agent }, (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => {
        let body = null;
        try {
          body = JSON.parse(text);
        } catch {
          /* not JSON */
        }
        resolve({ what, status: res.statusCode ?? -1, body, retryAfter: res.headers['retry-after'] as string, startedAt, at: Date.now() });
      });
    });
    req.setTimeout(10_000, () => req.destroy(new Error('no answer in time')));
    req.on('error', (err) => resolve({ what, status: -1, body: { error: { code: err.message } }, startedAt, at: Date.now() }));
    req.end(payload);
  });
}

/** Run a script; `onLine` sees each stdout line with the time it arrived. */
function script(name: string, args: string[], onLine: (line: string, at: number) => void = () => {}) {
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve) => {
    const child = spawn(process.execPath, [`scripts/${name}.mjs`, ...args], {
      env: {
        ...process.env,
        MARIADB_SOCKET: db.socket,
        DB_NAME: db.db.name,
        DB_USER: db.db.user,
        DB_PASSWORD: db.db.password,
        BACKUP_DIR: backups,
        UPLOADS_DIR: t.config.uploadsDir,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (c: Buffer) => {
      const at = Date.now();
      for (const line of c.toString().split('\n')) if (line) onLine(line, at);
      stdout += c;
    });
    child.stderr.on('data', (c) => (stderr += c));
    child.on('exit', (code) => resolve({ code, stdout, stderr }));
  });
}

beforeAll(async () => {
  db = await startPrivateMariaDb({ database: 'scanwright_faults_restore' });
  t = await startTestApp({ db: db.db });
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  port = (server.address() as AddressInfo).port;
  backups = mkdtempSync(join(tmpdir(), 'scanwright-restore-backups-'));
}, 60_000);

afterAll(async () => {
  server?.closeAllConnections();
  await new Promise((r) => (server ? server.close(r) : r(undefined)));
  await t?.close();
  await db?.destroy();
  agent.destroy();
  if (backups) rmSync(backups, { recursive: true, force: true });
});

describe('when db:restore runs while makers keep writing', () => {
  const log: Outcome[] = [];
  const at = { backupStart: 0, fence: 0, open: 0, restoreEnd: 0 };
  let restoreOut = '';
  let archive = '';
  let maker: Who;
  let carried: string[] = [];

  beforeAll(async () => {
    const owner = await createUser();
    const a = await signIn(t, owner.login);
    maker = { cookie: (await a.get('/api/session').expect(200)).request.cookies as unknown as string, csrf: a.csrf };
    const draft = (n: number) =>
      call('create-build', '/api/builds', {
        method: 'POST',
        as: maker,
        json: { title: `Restore draft ${n}`, instrumentKind: 'profilometer', summary: 'Written around a restore.' },
      }).then((o) => (log.push(o), o));
    for (let i = 0; i < 5; i++) expect((await draft(i)).status).toBe(201);

    // Three mails queued before the backup but due only after it: sent between the backup and the restore.
    const later = new Date(Date.now() + 3600_000);
    carried = ['a', 'b', 'c'].map((x) => `Carried mail ${x} ${Date.now()}`);
    const rows = await Promise.all(
      carried.map((subject) =>
        OutboxMail.create({ toAddress: 'carry@example.org', subject, textBody: 't', htmlBody: '<p>t</p>', nextAttemptAt: later }),
      ),
    );
    at.backupStart = Date.now();
    const made = await script('db-backup', []);
    expect(made.code).toBe(0);
    archive = /to (\S+\.tar\.gz)/.exec(made.stdout)![1];
    await OutboxMail.update({ nextAttemptAt: new Date() }, { where: { id: rows.map((r) => r.id) } });
    await t.mail.waitFor((m) => m.subject === carried[2], 10_000);

    // The load: two writers and a reader, from before the restore until after it.
    let running = true;
    let n = 100;
    const writer = async () => {
      while (running) {
        await draft(n++);
        await pause(20);
      }
    };
    const reader = async () => {
      while (running) {
        log.push(await call('read-builds', '/api/builds'));
        log.push(await call('read-session', '/api/session', { as: maker }));
        await pause(20);
      }
    };
    const workers = [writer(), writer(), reader()];
    await pause(500);
    const restored = await script('db-restore', [archive, '--yes'], (line, when) => {
      if (line.startsWith('Writes are paused')) at.fence = when;
      if (line.startsWith('Writes are open again')) at.open = when;
    });
    at.restoreEnd = Date.now();
    restoreOut = restored.stdout + restored.stderr;
    if (restored.code !== 0) throw new Error(`restore failed:\n${restoreOut}`);
    // Writes go on until one sent after the fence was lifted is acknowledged: an instance reads the fence at most
    // once a second (server/middleware/maintenance.ts), so a fixed pause here could end before it sees it lifted.
    await waitFor(() => log.some((o) => o.what === 'create-build' && o.status === 201 && o.startedAt > at.open), {
      timeoutMs: 10_000,
      what: 'a write sent after the fence was lifted to be acknowledged',
    }).catch(() => undefined);
    await pause(300);
    running = false;
    await Promise.all(workers);
    await pause(1500); // let the outbox send what is due
  }, 80_000);

  test('then it fenced, switched and lifted the fence, and measured how long writes were refused', () => {
    expect(at.fence).toBeGreaterThan(0);
    expect(at.open).toBeGreaterThan(at.fence);
    expect(restoreOut).toMatch(/Switched to the restored tables in one statement/);
    const refused = log.filter((o) => o.status === 503);
    console.log(
      `[measured] restore took ${at.restoreEnd - at.fence} ms from fence; writes refused for ${at.open - at.fence} ms; ` +
        `${refused.length} writes answered 503, ${log.filter((o) => o.what === 'read-builds' && o.startedAt >= at.fence && o.at <= at.open).length} reads served meanwhile`,
    );
    expect(refused.length).toBeGreaterThan(0);
  });

  test('then no answer was a 5xx other than 503 maintenance with Retry-After, and every read succeeded', () => {
    const bad = log.filter((o) => o.status >= 500 && !(o.status === 503 && o.body?.error?.code === 'maintenance' && o.retryAfter));
    expect(bad).toEqual([]);
    expect(log.filter((o) => o.status < 0 || (o.status >= 400 && o.status !== 503))).toEqual([]);
    expect(log.filter((o) => o.what.startsWith('read') && o.status !== 200)).toEqual([]);
  });

  test('then every acknowledged write is there, unless it was sent before the fence could be seen', async () => {
    const acked = log.filter((o) => o.what === 'create-build' && o.status === 201);
    const [rows] = (await t.handle.sequelize.query(
      `SELECT id, title FROM builds WHERE id IN (${acked.map((o) => o.body!.id).join(',')})`,
    )) as [Array<{ id: number; title: string }>, unknown];
    const present = new Set(rows.map((r) => r.id));
    const missing = acked.filter((o) => !present.has(o.body!.id!));
    // Before the backup: all there.
    expect(acked.filter((o) => o.at < at.backupStart && !present.has(o.body!.id!))).toEqual([]);
    // Missing ones were all sent before the app could see the fence; none acknowledged after the switch is missing.
    expect(missing.filter((o) => o.startedAt >= at.fence + 1500)).toEqual([]);
    // In the fenced window (fence seen, before the switch) nothing was acknowledged at all.
    expect(acked.filter((o) => o.startedAt >= at.fence + 1500 && o.at < at.open - 500)).toEqual([]);
    expect(acked.filter((o) => o.startedAt > at.open).length).toBeGreaterThan(0);
    console.log(
      `[measured] ${acked.length} writes acknowledged, ${missing.length} rolled back (acknowledged after the backup, before the fence)`,
    );
  });

  test('then mails sent after the backup were carried over and none was delivered twice', async () => {
    expect(restoreOut).toMatch(/Marked 3 mail\(s\) as sent/);
    const sent = t.mail.messages.map((m) => `${m.to} ${m.subject}`);
    expect(sent.filter((s, i) => sent.indexOf(s) !== i)).toEqual([]);
    for (const subject of carried) expect(t.mail.messages.filter((m) => m.subject === subject)).toHaveLength(1);
    const [[{ n }]] = (await t.handle.sequelize.query(
      "SELECT COUNT(*) AS n FROM mail_outbox WHERE sent_at IS NULL AND to_address = 'carry@example.org'",
    )) as [Array<{ n: number }>, unknown];
    expect(Number(n)).toBe(0);
  });

  describe('and db:verify checks archives', () => {
    test('when the archive is fresh, then it says OK', async () => {
      const r = await script('db-verify', [archive]);
      expect([r.code, r.stdout]).toEqual([0, expect.stringContaining(`OK: ${archive}`)]);
    }, 60_000);

    test('when a row count in the manifest of the archive was changed, then it says NOT OK and what differs', async () => {
      const work = mkdtempSync(join(tmpdir(), 'scanwright-tamper-'));
      const tar = (args: string[]) =>
        new Promise<void>((resolve, reject) => spawn('tar', args).on('exit', (c) => (c === 0 ? resolve() : reject(new Error(`tar ${c}`)))));
      await tar(['-xzf', archive, '-C', work]);
      const manifest = JSON.parse(readFileSync(join(work, 'manifest.json'), 'utf8'));
      manifest.tables.builds += 1;
      writeFileSync(join(work, 'manifest.json'), JSON.stringify(manifest));
      const tampered = join(backups, 'tampered.tar.gz');
      await tar(['-czf', tampered, '-C', work, '.']);
      const r = await script('db-verify', [tampered]);
      rmSync(work, { recursive: true, force: true });
      expect(r.code).toBe(1);
      expect(r.stdout).toContain(`NOT OK: ${tampered}`);
      expect(r.stdout).toMatch(/table builds: \d+ rows after restore, manifest says \d+/);
    }, 60_000);
  });
});
