import type { ApiTokenDto } from '@shared/schemas/api-token.ts';
import type { ApiToken } from '../models/api-token.model.ts';

/** A token in its owner's list: name, scopes and dates, never the hash. */
export function presentApiToken(t: ApiToken): ApiTokenDto {
  return {
    id: t.id,
    name: t.name,
    scopes: t.scopes,
    createdAt: t.createdAt.toISOString(),
    lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
  };
}
