import type { Actor } from '@shared/policies.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { ApiTokenDto } from '@shared/schemas/api-token.ts';
import { ApiToken } from '../models/api-token.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';
import { presentApiToken } from '../presenters/api-token.presenter.ts';
import { recordAudit } from './audit.service.ts';
import { nameToken } from './audit-names.ts';

async function loadUser(userId: number): Promise<User> {
  const user = await User.findByPk(userId, { attributes: ['id', 'login', 'name'] });
  if (!user) throw new NotFoundError('No such user.');
  return user;
}

/** An account's API tokens for an admin (names, scopes, dates; never secrets), so a leaked one can be found. */
export async function listUserTokens(actor: Actor | null, userId: number): Promise<ApiTokenDto[]> {
  authorize(actor, 'user.tokens');
  const user = await loadUser(userId);
  const rows = await ApiToken.findAll({
    where: { userId: user.id },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map(presentApiToken);
}

/** An admin revokes someone's token (a leaked or misbehaving rig); the audit trail names the token and its owner. */
export async function revokeUserToken(actor: Actor | null, userId: number, tokenId: number): Promise<void> {
  authorize(actor, 'user.tokens');
  const user = await loadUser(userId);
  await withWriteTransaction(ApiToken.sequelize!, async (transaction) => {
    const token = await ApiToken.findOne({ where: { id: tokenId, userId: user.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (!token) throw new NotFoundError('No such token.');
    await token.destroy({ transaction });
    await recordAudit(
      actor,
      { action: 'token.revoke', targetType: 'user', targetId: user.id, targetLabel: nameToken(token, user) },
      transaction,
    );
  });
}
