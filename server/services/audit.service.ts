import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { AuditListDto, AuditQuery } from '@shared/schemas/review.ts';
import { AuditEntry } from '../models/audit-entry.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';

/** Write who did what to which thing (named in words as it is now), inside the same transaction as the change itself. */
export async function recordAudit(
  actor: Actor,
  entry: { action: string; targetType: string; targetId: number; targetLabel: string; note?: string | null },
  transaction: Transaction,
): Promise<void> {
  await AuditEntry.create(
    {
      actorId: actor.id,
      action: entry.action,
      targetType: entry.targetType,
      targetId: entry.targetId,
      targetLabel: entry.targetLabel.slice(0, 300),
      note: entry.note ?? null,
    },
    { transaction },
  );
}

/** The audit trail, newest first, filtered by moderator, thing and date range (UTC days, inclusive). */
export async function listAudit(actor: Actor | null, q: AuditQuery): Promise<AuditListDto> {
  authorize(actor, 'review.access');
  const where: WhereOptions<AuditEntry> = {};
  if (q.actorId) Object.assign(where, { actorId: q.actorId });
  if (q.targetType) Object.assign(where, { targetType: q.targetType });
  if (q.targetId) Object.assign(where, { targetId: q.targetId });
  const range: Record<symbol, Date> = {};
  if (q.from) range[Op.gte] = new Date(`${q.from}T00:00:00Z`);
  if (q.to) range[Op.lt] = new Date(new Date(`${q.to}T00:00:00Z`).getTime() + 86_400_000);
  if (q.from || q.to) Object.assign(where, { createdAt: range });
  const { rows, count } = await AuditEntry.findAndCountAll({
    where,
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  const users = new Map(
    (await User.findAll({ where: { id: [...new Set(rows.map((r) => r.actorId))] }, attributes: ['id', 'login'] })).map((u) => [u.id, u]),
  );
  return {
    items: rows.map((r) => ({
      id: r.id,
      actor: { id: r.actorId, login: users.get(r.actorId)?.login ?? 'unknown' },
      action: r.action,
      targetType: r.targetType,
      targetId: r.targetId,
      targetLabel: r.targetLabel,
      note: r.note,
      createdAt: r.createdAt.toISOString(),
    })),
    total: count,
    page: q.page,
    pageSize: q.pageSize,
  };
}
