import type { OutgoingMail } from './mail.service.ts';
import { APP_URL } from './outbox.service.ts';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A notice mail (review decisions, new messages): what happened, the moderator's note if any, and a link to the page on the site. */
export function noticeMail(opts: {
  subject: string;
  greeting: string;
  lines: string[];
  note: string | null;
  path: string;
  linkText: string;
}): Omit<OutgoingMail, 'to'> {
  const url = `${APP_URL}${opts.path}`;
  const text = [
    `Hello ${opts.greeting},`,
    '',
    ...opts.lines,
    ...(opts.note ? ['', 'Note from the moderator:', opts.note] : []),
    '',
    `${opts.linkText}: ${url}`,
    '',
    '— Scanwright. You can turn off non-essential mail in your account settings.',
  ].join('\n');
  const html = `<p>Hello ${esc(opts.greeting)},</p>${opts.lines.map((l) => `<p>${esc(l)}</p>`).join('')}${
    opts.note ? `<blockquote style="border-left:4px solid #C98A00;padding-left:8px">${esc(opts.note)}</blockquote>` : ''
  }<p><a href="${url}">${esc(opts.linkText)}</a></p><p style="color:#4A525C;font-size:12px">Scanwright. You can turn off non-essential mail in your account settings.</p>`;
  return { subject: opts.subject, text, html };
}
