// What admins and operators see of the mail outbox: mails given up (listed, re-queued) and the
// backlog figures that /api/ready and /metrics report.
import { Op, QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { GivenUpMailListDto, QueuedMailDto } from '@shared/schemas/outbox.ts';
import { OutboxMail } from '../models/outbox-mail.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { presentGivenUpMail } from '../presenters/outbox.presenter.ts';
import { kickOutbox, MAX_ATTEMPTS } from './outbox.service.ts';

const givenUp = { sentAt: null, attempts: { [Op.gte]: MAX_ATTEMPTS } };

/** The newest 100 mails given up, with the login of the account each was for (no addresses). */
export async function listGivenUpMails(actor: Actor | null): Promise<GivenUpMailListDto> {
  authorize(actor, 'outbox.manage');
  const { rows, count } = await OutboxMail.findAndCountAll({
    where: givenUp,
    attributes: ['id', 'toAddress', 'subject', 'attempts', 'lastError', 'createdAt', 'updatedAt'],
    order: [['id', 'DESC']],
    limit: 100,
  });
  const addresses = [...new Set(rows.map((m) => m.toAddress))];
  const users = addresses.length ? await User.findAll({ where: { email: addresses }, attributes: ['email', 'login'] }) : [];
  const loginOf = new Map(users.map((u) => [u.email, u.login]));
  return { items: rows.map((m) => presentGivenUpMail(m, loginOf.get(m.toAddress) ?? null)), total: count };
}

/** Put a given-up mail back in the queue: attempts from zero, due now; 409 when it was not given up. */
export async function requeueMail(actor: Actor | null, mailId: number): Promise<QueuedMailDto> {
  authorize(actor, 'outbox.manage');
  const mail = await OutboxMail.findByPk(mailId, { attributes: ['id', 'sentAt', 'attempts'] });
  if (!mail) throw new NotFoundError('No such mail.');
  const nextAttemptAt = new Date();
  const [changed] = await OutboxMail.update(
    { attempts: 0, nextAttemptAt, claimedBy: null, claimedUntil: null },
    { where: { id: mailId, ...givenUp } },
  );
  if (changed === 0) throw new ConflictError('This mail was not given up: it is sent or still being tried.', 'mail_not_given_up');
  kickOutbox();
  return { id: mailId, attempts: 0, nextAttemptAt: nextAttemptAt.toISOString() };
}

export interface OutboxStats {
  /** Unsent mails still being tried. */
  backlog: number;
  /** Age of the oldest of those, in seconds (0 when none). */
  oldestAgeS: number;
  /** Unsent mails given up. */
  givenUp: number;
}

/** One query over the unsent rows (indexed by sent_at). */
export async function outboxStats(sequelize: Sequelize): Promise<OutboxStats> {
  const [row] = await sequelize.query<{ backlog: number | null; oldest: Date | string | null; givenUp: number | null }>(
    `SELECT SUM(attempts < :max) AS backlog, SUM(attempts >= :max) AS givenUp,
            MIN(CASE WHEN attempts < :max THEN created_at END) AS oldest
       FROM mail_outbox WHERE sent_at IS NULL`,
    { replacements: { max: MAX_ATTEMPTS }, type: QueryTypes.SELECT },
  );
  const oldest = row?.oldest ? new Date(row.oldest).getTime() : null;
  return {
    backlog: Number(row?.backlog ?? 0),
    givenUp: Number(row?.givenUp ?? 0),
    oldestAgeS: oldest === null ? 0 : Math.max(0, (Date.now() - oldest) / 1000),
  };
}
