import { z } from 'zod';
import { singleLine } from './text.ts';

/** What a personal API token may do: post runs from a rig, or read as its owner. */
export const TOKEN_SCOPES = ['runs:write', 'read'] as const;
export type TokenScope = (typeof TOKEN_SCOPES)[number];

export const tokenScopeLabels: Record<TokenScope, string> = {
  'runs:write': 'Add calibration runs to my actuators',
  read: 'Read what I can see when signed in',
};

/** The secret's visible prefix, so a leaked token is recognisable in logs and secret scanners. */
export const TOKEN_PREFIX = 'swt_';

/** At most this many tokens per person: enough for a few rigs, few enough to review. */
export const MAX_TOKENS_PER_USER = 20;

export const createApiTokenInput = z.strictObject({
  name: singleLine(80).min(1, 'Give the token a name.'),
  scopes: z
    .array(z.enum(TOKEN_SCOPES))
    .min(1, 'Choose at least one scope.')
    .max(TOKEN_SCOPES.length)
    .transform((s) => TOKEN_SCOPES.filter((scope) => s.includes(scope))),
});
export type CreateApiTokenInput = z.infer<typeof createApiTokenInput>;

export const apiTokenIdParams = z.strictObject({ tokenId: z.coerce.number().int().positive() });

/** A token as its owner's list shows it: never the secret or its hash. */
export interface ApiTokenDto {
  id: number;
  name: string;
  scopes: TokenScope[];
  createdAt: string;
  lastUsedAt: string | null;
}

/** The answer to creating a token: the only time the secret is shown. */
export interface CreatedApiTokenDto {
  id: number;
  name: string;
  scopes: TokenScope[];
  token: string;
  createdAt: string;
}
