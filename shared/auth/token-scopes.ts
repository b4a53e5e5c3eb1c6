// The one table of what a personal API token may reach, per scope. The server's bearer-token
// middleware asks `tokenMayRequest` before any route runs; the account page lists the same words.
import type { TokenScope } from '../schemas/api-token.ts';
import { pathMatches } from './path-pattern.ts';

type Method = 'GET' | 'HEAD' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** A method and a path pattern: `:name` is one segment, a final `*` one or more. */
interface ScopeRule {
  method: Method;
  path: string;
}

/** Scope → the requests it allows. A `runs:write` token reaches run creation and run edits, nothing else. */
const TOKEN_SCOPE_RULES: Record<TokenScope, readonly ScopeRule[]> = {
  'runs:write': [
    { method: 'POST', path: '/api/actuators/:actuatorId/runs' },
    { method: 'PATCH', path: '/api/runs/:runId' },
  ],
  read: [
    { method: 'GET', path: '/api/*' },
    { method: 'HEAD', path: '/api/*' },
  ],
};

/**
 * Never with a token, whatever its scopes: managing tokens needs a browser session (a leaked token
 * must not mint or list others, nor an admin's token revoke them), and the session route hands out CSRF tokens.
 */
const NEVER_WITH_A_TOKEN: readonly string[] = [
  '/api/account/tokens',
  '/api/account/tokens/*',
  '/api/admin/users/:userId/tokens',
  '/api/admin/users/:userId/tokens/*',
  '/api/session',
];

/** Whether a token with these scopes may send `method` to `path` (the path without its query). */
export function tokenMayRequest(scopes: readonly TokenScope[], method: string, path: string): boolean {
  if (NEVER_WITH_A_TOKEN.some((p) => pathMatches(p, path))) return false;
  return scopes.some((scope) => TOKEN_SCOPE_RULES[scope].some((rule) => rule.method === method && pathMatches(rule.path, path)));
}
