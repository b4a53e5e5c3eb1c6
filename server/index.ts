// Process entry: start the local stand-ins when no real services are configured, then listen.
// SIGTERM/SIGINT: stop accepting, finish in-flight requests, close the pool, exit 0.
import type { Server } from 'node:http';
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
if (config.github.standIn) oauth = await startOAuthStandIn(ports.oauth);
if (!config.smtpUrl) catcher = await startSmtpCatcher(ports.smtp, ports.inbox);

const mailer = createMailer(config.smtpUrl ?? catcher!.smtpUrl, config.mailFrom, log);
const handle = await createApp(config, { mailer, log });
const server: Server = handle.app.listen(config.port, config.host, () => {
  const lines = [
    '',
    '  Scanwright is running',
    `  App          ${config.publicUrl}`,
    oauth ? `  Sign-in      local stand-in at ${oauth.url} (GitHub when GITHUB_CLIENT_ID/SECRET are set)` : '  Sign-in      GitHub',
    catcher ? `  Mail inbox   ${catcher.inboxUrl}` : `  Mail         ${config.smtpUrl}`,
    oauth
      ? `  Demo logins  ${DEMO_ACCOUNTS.slice(0, 3)
          .map((a) => a.login)
          .join(', ')} (+ ${DEMO_ACCOUNTS.length - 3} demo makers)`
      : '',
    '  Stop         Ctrl-C',
    '',
  ].filter((l) => l !== '');
  process.stdout.write(`${lines.join('\n')}\n\n`);
});
server.keepAliveTimeout = 5000;

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  // Stop listening first, so that once "shutting down" is logged no new connection is accepted.
  const closed = new Promise<void>((resolve) => server.once('close', () => resolve()));
  server.close();
  server.closeIdleConnections();
  log.info({ signal }, 'shutting down');
  const force = setTimeout(() => {
    log.error('forced exit after 10 s');
    process.exit(1);
  }, 10_000);
  force.unref();
  await closed;
  await handle.close();
  await oauth?.close();
  await catcher?.close();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('unhandledRejection', (err) => {
  log.fatal({ err }, 'unhandled rejection');
  process.exit(1);
});
