import { z } from 'zod';

/** A mail the outbox gave up on (every attempt failed), as the admin page lists it; no e-mail address. */
export interface GivenUpMailDto {
  id: number;
  subject: string;
  /** The account the address belongs to, when one does (admins see logins, not addresses). */
  recipientLogin: string | null;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  lastAttemptAt: string;
}

export interface GivenUpMailListDto {
  items: GivenUpMailDto[];
  total: number;
}

/** A queued mail, as a re-queue answers it. */
export interface QueuedMailDto {
  id: number;
  attempts: number;
  nextAttemptAt: string;
}

export const mailIdParams = z.strictObject({ mailId: z.coerce.number().int().positive() });
