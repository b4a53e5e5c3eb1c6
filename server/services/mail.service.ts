import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from '../logger.ts';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Extra headers (List-Unsubscribe, RFC 8058). */
  headers?: Record<string, string>;
}

/** What one send came to; a failure carries its error so the outbox can log it and retry. */
export type SendResult = { ok: true } | { ok: false; error: unknown };

export interface Mailer {
  /** Send without ever throwing into the caller: a failed send comes back as the result, not as an exception. */
  send(mail: OutgoingMail): Promise<SendResult>;
  /** Whether the relay answers now (connect, greeting, EHLO, QUIT); never throws. */
  verify(): Promise<boolean>;
  close(): void;
}

/**
 * nodemailer over SMTP (the local catcher in development and tests). Connection, greeting and socket
 * timeouts are bounded (10 s by default), so a relay that accepts and never answers fails a send in
 * seconds instead of holding the sender for minutes (nodemailer's defaults are 2 min, 30 s and 10 min).
 */
export function createMailer(smtpUrl: string, from: string, log: Logger, opts: { timeoutMs?: number } = {}): Mailer {
  const timeoutMs = opts.timeoutMs ?? 10_000;
  const transport: Transporter = nodemailer.createTransport({
    url: smtpUrl,
    connectionTimeout: timeoutMs,
    greetingTimeout: timeoutMs,
    socketTimeout: timeoutMs,
    dnsTimeout: timeoutMs,
  } as Parameters<typeof nodemailer.createTransport>[0]);
  return {
    async send(mail) {
      try {
        const info = await transport.sendMail({ from, ...mail });
        log.debug({ messageId: info.messageId }, 'mail handed to SMTP');
        return { ok: true };
      } catch (error) {
        return { ok: false, error };
      }
    },
    verify: () =>
      transport.verify().then(
        () => true,
        () => false,
      ),
    close: () => transport.close(),
  };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The first-sign-in greeting, in plain text and HTML. */
export function welcomeMail(login: string, appUrl: string): Omit<OutgoingMail, 'to'> {
  const text = [
    `Hello ${login},`,
    '',
    'Welcome to Scanwright. You can now write build logs, record calibration runs for your actuators,',
    'propose parts for the registry and post listings on the exchange.',
    '',
    `Start here: ${appUrl}`,
    '',
    'Piezo drivers run at tens to hundreds of volts and piezo elements hold charge: follow local',
    'electrical codes and qualified practice whenever you build or measure.',
  ].join('\n');
  const html =
    `<p>Hello ${escapeHtml(login)},</p><p>Welcome to Scanwright. You can now write build logs, record calibration ` +
    `runs for your actuators, propose parts for the registry and post listings on the exchange.</p><p><a ` +
    `href="${escapeHtml(appUrl)}">Open Scanwright</a></p><p style="color:#8a5a00">Piezo drivers run at tens to ` +
    `hundreds of volts and piezo elements hold charge: follow local electrical codes and qualified practice ` +
    `whenever you build or measure.</p>`;
  return { subject: 'Welcome to Scanwright', text, html };
}
