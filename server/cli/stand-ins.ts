// The local OAuth provider and SMTP catcher (with its inbox page) on their configured ports, for set-ups where several
// app instances share them (npm run cluster: the instances run with STAND_INS=external). Stops on SIGTERM/SIGINT.
import { standInPorts } from '../config.ts';
import { startOAuthStandIn } from '../dev/oauth-standin.ts';
import { startSmtpCatcher } from '../dev/smtp-catcher.ts';

const ports = standInPorts();
const oauth = await startOAuthStandIn(ports.oauth);
const catcher = await startSmtpCatcher(ports.smtp, ports.inbox);
process.stdout.write(`Stand-ins: sign-in ${oauth.url}, SMTP ${catcher.smtpUrl}, inbox ${catcher.inboxUrl}\n`);

async function stop() {
  await oauth.close();
  await catcher.close();
  process.exit(0);
}
process.on('SIGTERM', () => void stop());
process.on('SIGINT', () => void stop());
