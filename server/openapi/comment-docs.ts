// Route table rows (route-docs.ts): comments on published builds.
import { buildIdParams } from '@shared/schemas/build.ts';
import { commentIdParams, createCommentInput, hideCommentInput } from '@shared/schemas/comment.ts';
import { json, noContent, type RouteDoc } from './route-doc.ts';

export const commentDocs: RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/builds/:buildId/comments',
    summary: 'Comments on a published build, oldest first (hidden ones are not listed)',
    tag: 'Comments',
    auth: 'visitor',
    params: buildIdParams,
    response: json(200, '`{ items: [...] }`, each with its Markdown body and what you may do with it.'),
    errors: [404, 409],
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/comments',
    summary: 'Comment on a published build (Markdown); the build’s owner is mailed',
    description: 'At most 10 comments per 10 minutes per maker (429). A build that is not published answers 409 `build_not_published`.',
    tag: 'Comments',
    auth: 'session',
    params: buildIdParams,
    body: createCommentInput,
    response: json(201, 'The comment.'),
    errors: [409, 429],
  },
  {
    method: 'POST',
    path: '/api/comments/:commentId/hide',
    summary: 'Hide a comment, with a note on the audit trail (moderators, not on their own comment or build)',
    tag: 'Comments',
    auth: 'session',
    params: commentIdParams,
    body: hideCommentInput,
    response: noContent('Hidden: it leaves the list for everyone.'),
  },
];
