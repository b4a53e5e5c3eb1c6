import { can, type Actor } from '@shared/policies.ts';
import type { BuildCommentDto } from '@shared/schemas/comment.ts';
import type { BuildComment } from '../models/build-comment.model.ts';

/** A visible comment with what this viewer may do with it; `authors` maps user ids to handles. */
export function presentComment(
  c: BuildComment,
  authors: ReadonlyMap<number, string>,
  viewer: Actor | null,
  buildOwnerId: number,
): BuildCommentDto {
  return {
    id: c.id,
    buildId: c.buildId,
    author: { id: c.authorId, login: authors.get(c.authorId) ?? 'a former maker' },
    body: c.body,
    createdAt: c.createdAt.toISOString(),
    abilities: {
      hide: can(viewer, 'comment.hide', { authorIds: [c.authorId, buildOwnerId] }),
      report: can(viewer, 'content.create') && viewer?.id !== c.authorId,
    },
  };
}
