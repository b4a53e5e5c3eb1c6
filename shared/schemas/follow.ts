import { z } from 'zod';

/** What a maker can follow: a build (new log entries), a part (newly counted runs) or a maker (new published builds). */
export const FOLLOW_TARGETS = ['build', 'part', 'maker'] as const;
export type FollowTargetType = (typeof FOLLOW_TARGETS)[number];

export const followParams = z.strictObject({
  targetType: z.enum(FOLLOW_TARGETS),
  targetId: z.coerce.number().int().positive(),
});
export type FollowParams = z.infer<typeof followParams>;

export interface FollowStateDto {
  targetType: FollowTargetType;
  targetId: number;
  following: boolean;
  /** How many people follow it. */
  followers: number;
}

/** One thing the signed-in maker follows, named as its page names it. */
export interface FollowDto {
  targetType: FollowTargetType;
  targetId: number;
  label: string;
  path: string;
  since: string;
}
