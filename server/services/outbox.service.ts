import { randomBytes } from 'node:crypto';
import { hostname } from 'node:os';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import pLimit from 'p-limit';
import { OutboxMail } from '../models/outbox-mail.model.ts';
import { User } from '../models/user.model.ts';
import type { Logger } from '../logger.ts';
import type { Mailer, OutgoingMail } from './mail.service.ts';
import { mailKindLabels, type MailKind } from '@shared/schemas/mail-choices.ts';
import { mailingFor } from './mail-choices.service.ts';

import { APP_URL } from './outbox-placeholders.ts';

export { APP_URL };
/** After this many failed sends a mail is given up: listed for admins, counted in /metrics, re-queued by hand. */
export const MAX_ATTEMPTS = 8;
/** Mails claimed per concurrent send in one batch: small, so other instances share a backlog. */
const BATCH = 3;

/** A send error as the logs and the row keep it, the recipient's address cut out (SMTP refusals often quote it). */
function sendError(error: unknown, address: string): { name: string; message: string; code?: string; responseCode?: number } {
  const e = (error ?? {}) as { name?: string; message?: string; code?: string; responseCode?: number };
  const message = String(e.message ?? error)
    .split(address)
    .join('<recipient>');
  return { name: e.name ?? 'Error', message, code: e.code, responseCode: e.responseCode };
}

/**
 * The relay itself failed (no connection, no greeting, a socket timeout, 421 "service not available"),
 * as opposed to a refusal of this one mail: the worker then stops sending until the relay answers again.
 */
function relayFailure(err: { code?: string; responseCode?: number }): boolean {
  return /^(ECONNECTION|ETIMEDOUT|ESOCKET|EDNS|ECONNREFUSED|ECONNRESET|EPIPE)$/.test(err.code ?? '') || err.responseCode === 421;
}

/** Who a mail was for, without the address: the role of the account that has it, or that none does (any more). */
async function recipientKind(address: string): Promise<string> {
  const user = await User.findOne({ where: { email: address }, attributes: ['role'] }).catch(() => undefined);
  if (user === undefined) return 'unknown';
  return user ? user.role : 'no-account';
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * Queue a mail in the caller's transaction, so it exists exactly when the decision does.
 * `essential` mail (about the recipient's own builds) ignores the opt-out from non-essential mail; the rest respects it.
 * A mail of a `kind` is not queued when the recipient turned that kind off, and carries a one-click unsubscribe
 * (List-Unsubscribe and List-Unsubscribe-Post headers, RFC 8058 §3.1) and a footer link to the same choice.
 */
export async function enqueueMail(
  recipient: { id?: number; email: string | null; mailOptOut: boolean },
  mail: Omit<OutgoingMail, 'to'>,
  opts: { essential: boolean; kind: MailKind | null; transaction?: Transaction },
): Promise<boolean> {
  if (!recipient.email || (!opts.essential && recipient.mailOptOut)) return false;
  let { text, html } = mail;
  let headers: Record<string, string> | null = null;
  if (opts.kind && recipient.id) {
    const { wanted, links } = await mailingFor(recipient.id, opts.kind, opts.transaction);
    if (!wanted) return false;
    if (links) {
      headers = { 'List-Unsubscribe': `<${links.oneClick}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' };
      const what = mailKindLabels[opts.kind].title.toLowerCase();
      text += `\n\nStop mails about ${what}: ${links.page}`;
      html += `<p style="color:#4A525C;font-size:12px"><a href="${links.page}">Stop mails about ${escapeHtml(what)}</a></p>`;
    }
  }
  await OutboxMail.create(
    {
      toAddress: recipient.email,
      subject: mail.subject,
      textBody: text,
      htmlBody: html,
      headers: headers && JSON.stringify(headers),
      nextAttemptAt: new Date(),
    },
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
  /**
   * Stop: no new mail is started, the mails in the relay's hands finish (waiting at most `waitMs`), and the
   * claims on mails not started are given back at once, so another instance sends them without waiting for the lease.
   */
  stop(waitMs?: number): Promise<void>;
}

export interface OutboxOptions {
  appUrl: string;
  log: Logger;
  intervalMs?: number;
  /** How long a claim holds (s); longer than the slowest send (three bounded SMTP timeouts). */
  leaseS?: number;
  /** Mails in the relay's hands at once. */
  concurrency?: number;
  /** Called once per mail given up (the /metrics counter). */
  onGivenUp?: () => void;
  /** A pass failed (the database went away, say); logged as a warning unless this takes it. */
  onPassFailed?: (err: unknown) => void;
}

/**
 * Sends queued mail in the background and retries failures with exponential backoff (30 s · 2^n).
 *
 * Several instances may run against one database: each pass first claims due mails with one UPDATE that
 * sets `claimed_by` (this instance) and `claimed_until` (a lease) on rows nobody holds, then sends only
 * what it claimed. InnoDB locks the rows that UPDATE writes, so two workers never claim the same row;
 * a worker that dies mid-send leaves a lease that expires, and another instance takes the mail then.
 * When the relay itself fails, the worker stops sending and checks the relay each pass; once it answers
 * again the backoff of every waiting mail is reset, so nothing waits out a long delay for an outage.
 */
export function startOutboxWorker(mailer: Mailer, opts: OutboxOptions): OutboxWorker {
  const { appUrl, log, intervalMs = 5000, leaseS = 120, concurrency = 3 } = opts;
  const me = `${hostname().slice(0, 40)}:${process.pid}:${randomBytes(4).toString('hex')}`;
  const limit = pLimit(concurrency);
  let running: Promise<number> | null = null;
  let stopping = false;
  let relayDown = false;
  const fill = (s: string) => s.split(APP_URL).join(appUrl);
  const sequelize = () => OutboxMail.sequelize!;

  async function claim(): Promise<OutboxMail[]> {
    await sequelize().query(
      `UPDATE mail_outbox SET claimed_by = :me, claimed_until = NOW() + INTERVAL :leaseS SECOND
        WHERE sent_at IS NULL AND attempts < :max AND next_attempt_at <= :now
          AND (claimed_until IS NULL OR claimed_until < NOW())
        ORDER BY id LIMIT :n`,
      { replacements: { me, leaseS, max: MAX_ATTEMPTS, now: new Date(), n: BATCH * concurrency }, type: QueryTypes.UPDATE },
    );
    return OutboxMail.findAll({
      where: { claimedBy: me, sentAt: null, attempts: { [Op.lt]: MAX_ATTEMPTS } },
      order: [['id', 'ASC']],
    });
  }

  /** Mails in the relay's hands right now: their claims stay until their send ends. */
  const inFlight = new Set<number>();
  /** Give back this instance's claims on mails it has not started (stopping, or the relay went down mid-pass). */
  const releaseClaims = () =>
    OutboxMail.update(
      { claimedBy: null, claimedUntil: null },
      { where: { claimedBy: me, sentAt: null, ...(inFlight.size ? { id: { [Op.notIn]: [...inFlight] } } : {}) } },
    );

  /** The relay answers again: every mail waiting out a backoff is due now. */
  async function relayBack(): Promise<void> {
    relayDown = false;
    const [reset] = await OutboxMail.update(
      { nextAttemptAt: new Date() },
      { where: { sentAt: null, attempts: { [Op.gt]: 0, [Op.lt]: MAX_ATTEMPTS }, nextAttemptAt: { [Op.gt]: new Date() } } },
    );
    log.info({ reset }, 'mail relay answers again; backoff reset');
  }

  async function sendOne(m: OutboxMail): Promise<boolean> {
    if (stopping || relayDown) return false;
    inFlight.add(m.id);
    try {
      return await sendAndRecord(m);
    } finally {
      inFlight.delete(m.id);
    }
  }

  async function sendAndRecord(m: OutboxMail): Promise<boolean> {
    const headers = m.headers ? (JSON.parse(fill(m.headers)) as Record<string, string>) : undefined;
    const result = await mailer.send({
      to: m.toAddress,
      subject: fill(m.subject),
      text: fill(m.textBody),
      html: fill(m.htmlBody),
      headers,
    });
    const attempts = m.attempts + 1;
    const mine = { where: { id: m.id, claimedBy: me } };
    if (result.ok) {
      await OutboxMail.update({ sentAt: new Date(), attempts, lastError: null, claimedBy: null, claimedUntil: null }, mine);
      if (relayDown) await relayBack();
      return true;
    }
    const err = sendError(result.error, m.toAddress);
    if (relayFailure(err) && !relayDown) {
      relayDown = true;
      log.warn({ err }, 'mail relay not answering; sending paused until it does');
    }
    const nextAttemptAt = new Date(Date.now() + 30_000 * 2 ** (attempts - 1));
    const lastError = `${err.name}: ${err.message}`.slice(0, 500);
    await OutboxMail.update({ attempts, nextAttemptAt, lastError, claimedBy: null, claimedUntil: null }, mine);
    if (attempts < MAX_ATTEMPTS) {
      log.warn({ mailId: m.id, attempt: attempts, err, nextAttemptAt }, 'mail send failed; will retry');
    } else {
      opts.onGivenUp?.();
      log.error(
        { mailId: m.id, recipientKind: await recipientKind(m.toAddress), attempts, err },
        'mail given up: not sent after the last attempt',
      );
    }
    return false;
  }

  async function sendDue(): Promise<number> {
    if (stopping) return 0;
    if (relayDown) {
      if (!(await mailer.verify())) return 0;
      await relayBack();
    }
    // Claim and send batch after batch until nothing is due, so a backlog drains at the relay's pace.
    let sent = 0;
    for (;;) {
      const due = await claim();
      if (due.length === 0) return sent;
      try {
        const results = await Promise.all(due.map((m) => limit(() => sendOne(m))));
        sent += results.filter(Boolean).length;
      } finally {
        await releaseClaims();
      }
      if (due.length < BATCH * concurrency || stopping || relayDown) return sent;
    }
  }

  const flush = () => {
    running ??= sendDue()
      .catch((err: unknown) => {
        if (opts.onPassFailed) opts.onPassFailed(err);
        else log.warn({ err }, 'outbox pass failed');
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
    stop: async (waitMs = 5000) => {
      stopping = true;
      clearInterval(timer);
      kick = () => {};
      if (running) {
        let timeout: NodeJS.Timeout | undefined;
        await Promise.race([running, new Promise((r) => (timeout = setTimeout(r, waitMs)))]);
        clearTimeout(timeout);
      }
      await releaseClaims().catch(() => undefined);
    },
  };
}
