// Route table rows (route-docs.ts): administration: users and the outbox.
import { listUsersQuery, setRoleInput, setSuspendedInput, userIdParams, userTokenParams } from '@shared/schemas/user.ts';
import { mailIdParams } from '@shared/schemas/outbox.ts';
import { json, noContent, type RouteDoc } from './route-doc.ts';

/** Administration: users and the outbox. */
export const adminDocs: readonly RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/admin/users',
    summary: 'Users (admins)',
    tag: 'Admin',
    auth: 'session-or-token',
    scope: 'read',
    query: listUsersQuery,
    response: json(200, 'A page of users.'),
  },
  {
    method: 'PATCH',
    path: '/api/admin/users/:userId/role',
    summary: "Change a user's role (admins)",
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    body: setRoleInput,
    response: json(200, 'The user.'),
  },
  {
    method: 'PATCH',
    path: '/api/admin/users/:userId/suspension',
    summary: 'Suspend or restore a user (admins)',
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    body: setSuspendedInput,
    response: json(200, 'The user.'),
  },
  {
    method: 'GET',
    path: '/api/admin/users/:userId/tokens',
    summary: "A user's rig tokens (admins; never their secrets)",
    description: 'Browser session only, like the account page: a token cannot list tokens.',
    tag: 'Admin',
    auth: 'session',
    params: userIdParams,
    response: json(200, 'The tokens with created and last-used times.'),
  },
  {
    method: 'DELETE',
    path: '/api/admin/users/:userId/tokens/:tokenId',
    summary: "Revoke a user's rig token (admins)",
    description: 'For a leaked or misbehaving rig; the audit trail names the token and its owner.',
    tag: 'Admin',
    auth: 'session',
    params: userTokenParams,
    response: noContent('Revoked.'),
  },
  {
    method: 'GET',
    path: '/api/admin/outbox/given-up',
    summary: 'Mails the outbox gave up on (admins)',
    description: 'The newest 100 mails not sent after the last attempt, with the account they were for (a login, never an address).',
    tag: 'Admin',
    auth: 'session-or-token',
    scope: 'read',
    response: json(200, 'The given-up mails and their total.'),
  },
  {
    method: 'POST',
    path: '/api/admin/outbox/:mailId/requeue',
    summary: 'Put a given-up mail back in the queue (admins)',
    tag: 'Admin',
    auth: 'session',
    params: mailIdParams,
    response: json(200, 'The mail, due now with its attempts from zero.'),
    errors: [409],
  },
];
