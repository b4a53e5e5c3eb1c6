import { z } from 'zod';
import { multiLine } from './text.ts';
import { MAX_REVIEW_POST_CHARS } from './post-limits.ts';

export const createReviewPostInput = z.strictObject({
  body: multiLine(MAX_REVIEW_POST_CHARS).trim().min(1, 'Write something.'),
});
export type CreateReviewPostInput = z.infer<typeof createReviewPostInput>;

/** One post in a build's review thread, or one decision the desk made on it, in the order they happened. */
export type ReviewThreadItemDto =
  | { type: 'post'; id: number; author: { id: number; login: string }; side: 'maker' | 'moderator'; body: string; createdAt: string }
  | { type: 'decision'; id: number; action: string; label: string; note: string | null; by: string | null; createdAt: string };

export interface ReviewThreadDto {
  buildId: number;
  items: ReviewThreadItemDto[];
  abilities: { post: boolean };
}
