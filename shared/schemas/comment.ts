import { z } from 'zod';
import { multiLine } from './text.ts';
import { MAX_COMMENT_CHARS } from './post-limits.ts';

export const createCommentInput = z.strictObject({
  body: multiLine(MAX_COMMENT_CHARS).trim().min(1, 'Write something.'),
});
export type CreateCommentInput = z.infer<typeof createCommentInput>;

export const hideCommentInput = z.strictObject({ note: multiLine(1000).trim().min(1, 'Say why it is hidden.') });
export type HideCommentInput = z.infer<typeof hideCommentInput>;

export const commentIdParams = z.strictObject({ commentId: z.coerce.number().int().positive() });

/** A comment on a published build as everyone sees it (hidden ones are not listed). */
export interface BuildCommentDto {
  id: number;
  buildId: number;
  author: { id: number; login: string };
  /** Markdown, shown with the site's safe renderer. */
  body: string;
  createdAt: string;
  /** What the viewer may do with it (the server decides; the client only hides controls). */
  abilities: { hide: boolean; report: boolean };
}
