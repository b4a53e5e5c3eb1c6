import type { GivenUpMailDto } from '@shared/schemas/outbox.ts';
import type { OutboxMail } from '../models/outbox-mail.model.ts';

/** A given-up mail for the admin page: subject, who (as a login), the attempts and the last error; never the address. */
export function presentGivenUpMail(m: OutboxMail, recipientLogin: string | null): GivenUpMailDto {
  return {
    id: m.id,
    subject: m.subject,
    recipientLogin,
    attempts: m.attempts,
    lastError: m.lastError ?? null,
    createdAt: m.createdAt.toISOString(),
    lastAttemptAt: m.updatedAt.toISOString(),
  };
}
