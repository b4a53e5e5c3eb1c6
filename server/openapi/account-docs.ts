// Route table rows (route-docs.ts): my settings, the data licence and API tokens.
import { apiTokenIdParams, createApiTokenInput } from '@shared/schemas/api-token.ts';
import { accountSettingsInput } from '@shared/schemas/review.ts';
import { json, noContent, type RouteDoc } from './route-doc.ts';

/** My settings, the data licence and API tokens. */
export const accountDocs: readonly RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/account/settings',
    summary: 'My settings (mail opt-out)',
    tag: 'Account',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The settings.'),
  },
  {
    method: 'PATCH',
    path: '/api/account/settings',
    summary: 'Change my settings',
    tag: 'Account',
    auth: 'session',
    body: accountSettingsInput,
    response: json(200, 'The settings.'),
    example: { mailOptOut: true },
  },
  {
    method: 'GET',
    path: '/api/account/data-licence',
    summary: 'The data licence and whether I accepted it',
    tag: 'Account',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, '`{ licence, acceptedAt }`.'),
  },
  {
    method: 'POST',
    path: '/api/account/data-licence',
    summary: 'Accept the data licence (CC BY 4.0) for what I contribute',
    description: 'Idempotent: accepting again keeps the first date. Runs are not refused without it; the app asks once.',
    tag: 'Account',
    auth: 'session',
    response: json(200, '`{ licence, acceptedAt }`.'),
  },
  {
    method: 'GET',
    path: '/api/account/tokens',
    summary: 'My rig tokens (never their secrets)',
    description: 'Browser session only: a token cannot list or make tokens.',
    tag: 'Account',
    auth: 'session',
    response: json(200, 'The tokens with created and last-used times.'),
  },
  {
    method: 'POST',
    path: '/api/account/tokens',
    summary: 'Create a rig token',
    description: 'The secret (`swt_…`) is in this answer only; it is stored as a hash.',
    tag: 'Account',
    auth: 'session',
    body: createApiTokenInput,
    response: json(201, '`{ id, name, scopes, token, createdAt }`.'),
    example: { name: 'Capacitive rig in the shed', scopes: ['runs:write'] },
  },
  {
    method: 'DELETE',
    path: '/api/account/tokens/:tokenId',
    summary: 'Revoke a rig token',
    tag: 'Account',
    auth: 'session',
    params: apiTokenIdParams,
    response: noContent('Revoked.'),
  },
];
