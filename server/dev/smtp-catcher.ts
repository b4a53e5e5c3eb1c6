// A local SMTP catcher with an inbox page, used whenever SMTP_URL is not set.
import express from 'express';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  /** The one-click unsubscribe headers (RFC 8058) as sent, unfolded; null when absent. */
  listUnsubscribe: string | null;
  listUnsubscribePost: string | null;
  receivedAt: string;
}

/** A header's value from the raw header lines, unfolded (RFC 5322 §2.2.3). */
const headerValue = (lines: ReadonlyArray<{ key: string; line: string }>, key: string): string | null => {
  const found = lines.find((l) => l.key === key);
  return found
    ? found.line
        .slice(found.line.indexOf(':') + 1)
        .replace(/\r?\n[ \t]+/g, ' ')
        .trim()
    : null;
};

export interface SmtpCatcher {
  smtpUrl: string;
  inboxUrl: string | null;
  messages: CaughtMail[];
  /** Resolve with the first message matching, waiting up to timeoutMs for it to arrive. */
  waitFor(match: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function inboxPage(messages: CaughtMail[]): string {
  const rows = [...messages]
    .reverse()
    .map(
      (m) => `<article><header><b>${esc(m.subject)}</b><time>${esc(m.receivedAt)}</time></header>
<p class="meta">to ${esc(m.to.join(', '))} · from ${esc(m.from)}</p><pre>${esc(m.text)}</pre>
${m.html ? `<details><summary>HTML part</summary><iframe sandbox="" srcdoc="${esc(m.html)}"></iframe></details>` : ''}</article>`,
    )
    .join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Local inbox · Scanwright</title><style>
body{font-family:system-ui,sans-serif;background:#F6F4EF;color:#1D232B;margin:0;padding:1.5rem}
h1{font-size:1.2rem}article{background:#fff;border:1px solid #d8d3c8;border-radius:8px;padding:1rem;margin:.75rem 0;max-width:50rem}
header{display:flex;justify-content:space-between;gap:1rem}time,.meta{color:#5b636d;font-size:.85rem}
pre{white-space:pre-wrap;font-size:.9rem}iframe{width:100%;height:14rem;border:1px solid #ddd}</style></head>
<body><h1>Local inbox (${messages.length})</h1><p>Every e-mail Scanwright sends in development lands here; nothing leaves this machine.</p>${rows || '<p>No mail yet.</p>'}</body></html>`;
}

/** Start the catcher: SMTP on smtpPort, the inbox page on inboxPort (null: no page, e.g. in tests). */
export async function startSmtpCatcher(smtpPort: number, inboxPort: number | null): Promise<SmtpCatcher> {
  const messages: CaughtMail[] = [];
  const waiters = new Set<() => void>();
  let nextId = 1;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            id: nextId++,
            from: parsed.from?.text ?? session.envelope.mailFrom?.toString() ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            listUnsubscribe: headerValue(parsed.headerLines, 'list-unsubscribe'),
            listUnsubscribePost: headerValue(parsed.headerLines, 'list-unsubscribe-post'),
            receivedAt: new Date().toISOString(),
          });
          if (messages.length > 500) messages.shift();
          for (const w of waiters) w();
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, '127.0.0.1', () => resolve());
  });
  const smtpAddress = smtp.server.address() as AddressInfo;

  let web: Server | null = null;
  if (inboxPort !== null) {
    const app = express();
    app.get('/', (_req, res) => void res.type('html').send(inboxPage(messages)));
    app.get('/api/messages', (_req, res) => void res.json(messages));
    web = await new Promise((resolve) => {
      const s = app.listen(inboxPort, '127.0.0.1', () => resolve(s));
    });
  }
  const webPort = web ? (web.address() as AddressInfo).port : null;

  return {
    smtpUrl: `smtp://127.0.0.1:${smtpAddress.port}`,
    inboxUrl: webPort ? `http://127.0.0.1:${webPort}` : null,
    messages,
    waitFor(match, timeoutMs = 5000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          const found = messages.find(match);
          if (!found) return false;
          waiters.delete(check);
          clearTimeout(timer);
          resolve(found);
          return true;
        };
        const timer = setTimeout(() => {
          waiters.delete(check);
          reject(new Error('no matching mail arrived'));
        }, timeoutMs);
        waiters.add(check);
        check();
      });
    },
    async close() {
      await new Promise<void>((r) => smtp.close(() => r()));
      if (web) {
        web.closeAllConnections();
        await new Promise<void>((r) => web!.close(() => r()));
      }
    },
  };
}
