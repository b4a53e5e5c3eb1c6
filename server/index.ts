// Process entry: start the local stand-ins when no real services are configured, then listen.
// SIGTERM/SIGINT: drain (ready 503, `Connection: close`), stop accepting, finish in-flight requests,
// stop the outbox after its current mail, close the pool, exit 0 — or 1 when that takes past 10 s.
import type { Server } from 'node:http';
import { Server as NetServer } from 'node:net';
import { loadConfig, standInPorts } from './config.ts';
import { createLogger } from './logger.ts';
import { createApp } from './app.ts';
import { createMailer } from './services/mail.service.ts';
import { startOAuthStandIn, type OAuthStandIn } from './dev/oauth-standin.ts';
import { startSmtpCatcher, type SmtpCatcher } from './dev/smtp-catcher.ts';
import { DEMO_ACCOUNTS } from './dev/demo-accounts.ts';

const config = loadConfig();
const log = createLogger(config.logLevel);
const ports = standInPorts();

let oauth: OAuthStandIn | null = null;
let catcher: SmtpCatcher | null = null;
// With STAND_INS=external (npm run cluster) they run once for every instance (server/cli/stand-ins.ts) on the same ports.
if (config.github.standIn && !ports.external) oauth = await startOAuthStandIn(ports.oauth);
if (!config.smtpUrl && !ports.external) catcher = await startSmtpCatcher(ports.smtp, ports.inbox);

const mailer = createMailer(config.smtpUrl ?? catcher?.smtpUrl ?? `smtp://127.0.0.1:${ports.smtp}`, config.mailFrom, log, {
  timeoutMs: config.outbox.smtpTimeoutMs,
});
const handle = await createApp(config, { mailer, log });
const demoRest = (role: string) => DEMO_ACCOUNTS.slice(3).filter((a) => a.role === role).length;
const server: Server = handle.app.listen(config.port, config.host, () => {
  const lines = [
    '',
    '  Scanwright is running',
    `  App          ${config.publicUrl}`,
    oauth
      ? `  Sign-in      local stand-in at ${oauth.url} (GitHub when GITHUB_CLIENT_ID/SECRET are set)`
      : `  Sign-in      ${config.github.baseUrl}`,
    catcher ? `  Mail inbox   ${catcher.inboxUrl}` : `  Mail         ${config.smtpUrl ?? `smtp://127.0.0.1:${ports.smtp}`}`,
    config.github.standIn
      ? `  Demo logins  ${DEMO_ACCOUNTS.slice(0, 3)
          .map((a) => a.login)
          .join(', ')} (+ ${demoRest('maker')} demo makers, ${demoRest('moderator')} more moderator)`
      : '',
    '  Stop         Ctrl-C',
    '',
  ].filter((l) => l !== '');
  process.stdout.write(`${lines.join('\n')}\n\n`);
});
server.keepAliveTimeout = 5000;

let closing = false;
/** Connections idle this long after the drain starts are closed; busy ones close after their next response. */
const IDLE_GRACE_MS = 300;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  const started = Date.now();
  const force = setTimeout(() => {
    log.error('forced exit after 10 s');
    process.exit(1);
  }, 10_000);
  force.unref();
  // 1. /api/ready answers 503 and every response from now on (in flight ones too) says `Connection: close`.
  handle.drain.start();
  // 2. Stop listening, so that once "shutting down" is logged no new connection is accepted. net.Server's close,
  // not http.Server's: the latter also destroys idle keep-alive sockets at once, and a client that has just
  // sent its next request on one would see it cut. They are closed after a short grace instead.
  const closed = new Promise<void>((resolve) => server.once('close', () => resolve()));
  NetServer.prototype.close.call(server);
  log.info({ signal }, 'shutting down');
  const idle = setInterval(() => server.closeIdleConnections(), IDLE_GRACE_MS);
  // 3. In-flight requests finish; each connection closes after its answer.
  await closed;
  clearInterval(idle);
  // 4. The outbox stops after its current mail, the session store and the pools close.
  await handle.close();
  await oauth?.close();
  await catcher?.close();
  log.info({ ms: Date.now() - started }, 'drained; exiting');
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('unhandledRejection', (err) => {
  log.fatal({ err }, 'unhandled rejection');
  process.exit(1);
});
