import { Op, type Transaction } from 'sequelize';
import { OutboxMail } from '../models/outbox-mail.model.ts';
import { User } from '../models/user.model.ts';
import type { Logger } from '../logger.ts';
import type { Mailer, OutgoingMail } from './mail.service.ts';

/** Placeholder for the app's public address; the worker fills it in at send time. */
export const APP_URL = '{{APP_URL}}';
const MAX_ATTEMPTS = 8;

/** A send error as the logs and the row keep it, the recipient's address cut out (SMTP refusals often quote it). */
function sendError(error: unknown, address: string): { name: string; message: string; code?: string; responseCode?: number } {
  const e = (error ?? {}) as { name?: string; message?: string; code?: string; responseCode?: number };
  const message = String(e.message ?? error)
    .split(address)
    .join('<recipient>');
  return { name: e.name ?? 'Error', message, code: e.code, responseCode: e.responseCode };
}

/** Who a mail was for, without the address: the role of the account that has it, or that none does (any more). */
async function recipientKind(address: string): Promise<string> {
  const user = await User.findOne({ where: { email: address }, attributes: ['role'] }).catch(() => undefined);
  if (user === undefined) return 'unknown';
  return user ? user.role : 'no-account';
}

/**
 * Queue a mail in the caller's transaction, so it exists exactly when the decision does.
 * `essential` mail (about the recipient's own builds) ignores the opt-out; the rest respects it.
 */
export async function enqueueMail(
  recipient: { email: string | null; mailOptOut: boolean },
  mail: Omit<OutgoingMail, 'to'>,
  opts: { essential: boolean; transaction?: Transaction },
): Promise<boolean> {
  if (!recipient.email || (!opts.essential && recipient.mailOptOut)) return false;
  await OutboxMail.create(
    { toAddress: recipient.email, subject: mail.subject, textBody: mail.text, htmlBody: mail.html, nextAttemptAt: new Date() },
    { transaction: opts.transaction },
  );
  return true;
}

let kick: () => void = () => {};
/** Ask the running worker (if any) to send now, after a decision has committed. Never waits. */
export function kickOutbox(): void {
  kick();
}

export interface OutboxWorker {
  /** Send what is due now; resolves with how many were sent. */
  flush(): Promise<number>;
  /** Stop the timer and wait for a pass in progress, so the pool can close under it safely. */
  stop(): Promise<void>;
}

/** Sends queued mail in the background and retries failures with exponential backoff (30 s · 2^n). */
export function startOutboxWorker(mailer: Mailer, appUrl: string, log: Logger, intervalMs = 5000): OutboxWorker {
  let running: Promise<number> | null = null;
  const fill = (s: string) => s.split(APP_URL).join(appUrl);
  async function sendDue(): Promise<number> {
    const due = await OutboxMail.findAll({
      where: { sentAt: null, attempts: { [Op.lt]: MAX_ATTEMPTS }, nextAttemptAt: { [Op.lte]: new Date() } },
      order: [['id', 'ASC']],
      limit: 25,
    });
    let sent = 0;
    for (const m of due) {
      const result = await mailer.send({ to: m.toAddress, subject: fill(m.subject), text: fill(m.textBody), html: fill(m.htmlBody) });
      const attempts = m.attempts + 1;
      if (result.ok) {
        await m.update({ sentAt: new Date(), attempts, lastError: null });
        sent++;
        continue;
      }
      const err = sendError(result.error, m.toAddress);
      const nextAttemptAt = new Date(Date.now() + 30_000 * 2 ** (attempts - 1));
      await m.update({ attempts, nextAttemptAt, lastError: `${err.name}: ${err.message}`.slice(0, 500) });
      if (attempts < MAX_ATTEMPTS) {
        log.warn({ mailId: m.id, attempt: attempts, err, nextAttemptAt }, 'mail send failed; will retry');
      } else {
        log.error(
          { mailId: m.id, recipientKind: await recipientKind(m.toAddress), attempts, err },
          'mail given up: not sent after the last attempt',
        );
      }
    }
    return sent;
  }
  const flush = () => {
    running ??= sendDue()
      .catch((err: unknown) => {
        log.warn({ err }, 'outbox pass failed');
        return 0;
      })
      .finally(() => {
        running = null;
      });
    return running;
  };
  const timer = setInterval(() => void flush(), intervalMs);
  timer.unref();
  kick = () => void flush();
  return {
    flush,
    stop: async () => {
      clearInterval(timer);
      kick = () => {};
      await running;
    },
  };
}
