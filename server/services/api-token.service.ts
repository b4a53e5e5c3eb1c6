import { createHash, randomBytes } from 'node:crypto';
import type { Actor } from '@shared/policies.ts';
import {
  MAX_TOKENS_PER_USER,
  TOKEN_PREFIX,
  type ApiTokenDto,
  type CreateApiTokenInput,
  type CreatedApiTokenDto,
  type TokenScope,
} from '@shared/schemas/api-token.ts';
import { ApiToken } from '../models/api-token.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { presentApiToken } from '../presenters/api-token.presenter.ts';

/** `swt_` and 32 random bytes in base64url (43 characters). */
const TOKEN_SHAPE = new RegExp(`^${TOKEN_PREFIX}[A-Za-z0-9_-]{43}$`);
/** lastUsedAt is written at most this often per token, so a busy rig does not write on every request. */
const LAST_USED_EVERY_MS = 60_000;

// 256 random bits need no salt or slow hash: nobody can guess their way to a preimage.
const hashOf = (secret: string) => createHash('sha256').update(secret).digest('hex');

/** Make a token for the signed-in person; the secret is in this answer only. */
export async function createApiToken(actor: Actor | null, input: CreateApiTokenInput): Promise<CreatedApiTokenDto> {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const count = await ApiToken.count({ where: { userId: actor.id } });
  if (count >= MAX_TOKENS_PER_USER) {
    throw new ConflictError(`You already have ${MAX_TOKENS_PER_USER} tokens; revoke one you no longer use first.`, 'too_many_tokens');
  }
  const secret = `${TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`;
  const row = await ApiToken.create({ userId: actor.id, name: input.name, scopes: input.scopes, tokenHash: hashOf(secret) });
  // Read back so createdAt is what the list will show (the column keeps whole seconds).
  const { id, name, scopes, createdAt } = presentApiToken(await row.reload());
  return { id, name, scopes, token: secret, createdAt };
}

/** The signed-in person's tokens, newest first. */
export async function listApiTokens(actor: Actor | null): Promise<ApiTokenDto[]> {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const rows = await ApiToken.findAll({
    where: { userId: actor.id },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map(presentApiToken);
}

/** Delete one of one's own tokens; someone else's is "not found", so ids reveal nothing. */
export async function revokeApiToken(actor: Actor | null, tokenId: number): Promise<void> {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const removed = await ApiToken.destroy({ where: { id: tokenId, userId: actor.id } });
  if (removed === 0) throw new NotFoundError('No such token.');
}

/** Who a bearer secret speaks for: null when it is malformed, unknown, revoked, or its owner is suspended or gone. */
export async function authenticateApiToken(secret: string): Promise<{ user: User; tokenId: number; scopes: TokenScope[] } | null> {
  if (!TOKEN_SHAPE.test(secret)) return null;
  const token = await ApiToken.findOne({ where: { tokenHash: hashOf(secret) } });
  if (!token) return null;
  const user = await User.findByPk(token.userId);
  if (!user || user.suspendedAt) return null;
  const now = Date.now();
  if (!token.lastUsedAt || now - token.lastUsedAt.getTime() >= LAST_USED_EVERY_MS) {
    await ApiToken.update({ lastUsedAt: new Date(now) }, { where: { id: token.id } });
  }
  return { user, tokenId: token.id, scopes: token.scopes };
}
