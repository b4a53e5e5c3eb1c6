// The review desk's build tools: a build's pending runs with their flags, the combined decision
// (publish the build and accept its runs that carry no flag), a run's raw points page by page, and
// the history of a build's reviews with what changed since the last one.
import { z } from 'zod';
import { multiLine } from './text.ts';
import type { FlagCode } from '../review/plausibility.ts';
import type { QueueRunDto } from './review.ts';

export const reviewBuildParams = z.strictObject({ buildId: z.coerce.number().int().positive() });
export const reviewRunParams = z.strictObject({ runId: z.coerce.number().int().positive() });

/** Rows of a run's raw record per page on the desk; at most 500. */
export const RUN_POINTS_PAGE_SIZE = 50;
export const runPointsQuery = z.strictObject({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(RUN_POINTS_PAGE_SIZE),
});
export type RunPointsQuery = z.infer<typeof runPointsQuery>;

/** One page of a run's raw record, numbers as recorded in the run's own units (the export's columns). */
export interface RunPointsPageDto {
  runId: number;
  kind: QueueRunDto['kind'];
  columns: string[];
  rows: Array<Array<string | number>>;
  total: number;
  page: number;
  pageSize: number;
}

/**
 * Publish a build and accept its runs that carry no flag. `acceptRunIds` are the runs the preview listed:
 * when the build's unflagged pending runs are no longer exactly these, nothing happens (409 plan_changed).
 */
export const publishWithRunsInput = z
  .strictObject({
    acceptRunIds: z.array(z.number().int().positive()).max(100),
    note: multiLine(4000).trim().optional(),
    /** Show the publish note on the public build page too. */
    notePublic: z.boolean().optional(),
  })
  .refine((v) => !v.notePublic || (v.note?.length ?? 0) > 0, {
    message: 'Only a note that was written can be shown to everyone.',
    path: ['notePublic'],
  });
export type PublishWithRunsInput = z.infer<typeof publishWithRunsInput>;

/** What the combined decision does: the runs it accepts and the flagged ones it leaves pending. */
export interface PublishWithRunsPlan {
  accept: number[];
  stayPending: Array<{ id: number; flags: FlagCode[] }>;
}

/** A build's pending runs as the desk shows them, and what "publish with runs" would do. */
export interface ReviewBuildRunsDto {
  buildId: number;
  runs: QueueRunDto[];
  plan: PublishWithRunsPlan;
}

/** What the combined decision did. */
export interface PublishWithRunsResultDto {
  id: number;
  status: 'published';
  accepted: Array<{ id: number; name: string }>;
  stayPending: Array<{ id: number; name: string; flags: FlagCode[] }>;
}

/** One run as a moderator saw it at a build decision. */
export interface ReviewedRun {
  id: number;
  /** The actuator's label (or axis) and the part's name. */
  actuator: string;
  /** The gain as every page prints it, with its ± and what the ± is. */
  gain: string;
  status: 'pending' | 'accepted' | 'rejected';
}

/** A piece of the write-up's word diff: unchanged, added or removed text. */
export interface TextChange {
  value: string;
  change: 'same' | 'added' | 'removed';
}

/** A run's change since the last review: added, removed, changed (gain or status) or the same. */
export interface RunChange {
  id: number;
  actuator: string;
  change: 'added' | 'removed' | 'changed' | 'same';
  before: { gain: string; status: ReviewedRun['status'] } | null;
  after: { gain: string; status: ReviewedRun['status'] } | null;
}

/** One decision on the build or one of its runs, from the audit trail. */
export interface ReviewDecisionDto {
  id: number;
  action: string;
  targetType: 'build' | 'run';
  targetId: number;
  targetLabel: string | null;
  moderator: string;
  note: string | null;
  createdAt: string;
}

/** A build's earlier decisions and notes, and what changed in its write-up and runs since the last review. */
export interface ReviewHistoryDto {
  buildId: number;
  decisions: ReviewDecisionDto[];
  /** The last build decision with a snapshot; null when nobody has reviewed it yet (or before snapshots were kept). */
  lastReview: { decision: string; moderator: string; at: string } | null;
  /** Null without a last review. */
  writeUp: { changed: boolean; changes: TextChange[] } | null;
  runs: RunChange[] | null;
}
