import { z } from 'zod';
import { MAIL_KINDS, type MailKind } from './mail-choices.ts';
import { multiLine } from './text.ts';
import type { PlausibilityFlag } from '../review/plausibility.ts';
import type { RunFitDto } from './run.ts';
import type { RunKind } from './run-vocabulary.ts';
import type { PartStatsDto } from './part.ts';
import { REPORT_TARGETS, type ReportTargetType, REPORT_REASONS, type ReportReason } from './review-vocabulary.ts';

const note = multiLine(4000).trim();

/** Publish needs no note; return and decline must say why. */
export const buildDecisionInput = z
  .strictObject({
    decision: z.enum(['publish', 'return', 'decline']),
    note: note.optional(),
    /** Show the publish note on the public build page too (otherwise the owner and moderators only). */
    notePublic: z.boolean().optional(),
  })
  .refine((v) => v.decision === 'publish' || (v.note?.length ?? 0) > 0, {
    message: 'A note is required to return or decline.',
    path: ['note'],
  })
  .refine((v) => !v.notePublic || (v.decision === 'publish' && (v.note?.length ?? 0) > 0), {
    message: 'Only a note written with a publish decision can be shown to everyone.',
    path: ['notePublic'],
  });
export type BuildDecisionInput = z.infer<typeof buildDecisionInput>;

/** Accept needs no note; reject must say why. Used for runs and parts. */
export const acceptRejectInput = z
  .strictObject({ decision: z.enum(['accept', 'reject']), note: note.optional() })
  .refine((v) => v.decision === 'accept' || (v.note?.length ?? 0) > 0, { message: 'A note is required to reject.', path: ['note'] });
export type AcceptRejectInput = z.infer<typeof acceptRejectInput>;

export const reportDecisionInput = z.strictObject({ decision: z.enum(['resolve', 'dismiss']), note: note.min(1, 'Say what you did.') });
export type ReportDecisionInput = z.infer<typeof reportDecisionInput>;

export const createReportInput = z.strictObject({
  targetType: z.enum(REPORT_TARGETS),
  targetId: z.number().int().positive(),
  reason: z.enum(REPORT_REASONS),
  note: note.optional(),
});
export type CreateReportInput = z.infer<typeof createReportInput>;

export const reviewIdParams = z.strictObject({ id: z.coerce.number().int().positive() });

export const auditQuery = z.strictObject({
  actorId: z.coerce.number().int().positive().optional(),
  targetType: z.enum(['build', 'run', 'part', 'report', 'listing', 'user']).optional(),
  targetId: z.coerce.number().int().positive().optional(),
  from: z.iso.date().optional(),
  to: z.iso.date().optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(50),
});
export type AuditQuery = z.infer<typeof auditQuery>;

/** The master switch for non-essential mail, and/or the per-kind choices (kinds not named keep their setting). */
export const accountSettingsInput = z
  .strictObject({
    mailOptOut: z.boolean().optional(),
    mailChoices: z
      .strictObject(Object.fromEntries(MAIL_KINDS.map((k) => [k, z.boolean().optional()])) as Record<MailKind, z.ZodOptional<z.ZodBoolean>>)
      .optional(),
  })
  .refine((v) => v.mailOptOut !== undefined || v.mailChoices !== undefined, { message: 'Nothing to change.' });
export type AccountSettingsInput = z.infer<typeof accountSettingsInput>;

export interface ReviewAuthorDto {
  id: number;
  login: string;
}

export interface QueueBuildDto {
  id: number;
  title: string;
  instrumentKind: string;
  summary: string;
  author: ReviewAuthorDto;
  submittedAt: string | null;
  updatedAt: string;
  photoCount: number;
  entryCount: number;
  actuatorCount: number;
  pendingRunCount: number;
}

export interface QueueRunDto {
  id: number;
  buildId: number;
  buildTitle: string;
  actuatorLabel: string | null;
  axis: string;
  author: ReviewAuthorDto;
  part: { id: number; name: string; category: string; stats: PartStatsDto; acceptedGainsNmPerV: number[] };
  method: string;
  kind: RunKind;
  fit: RunFitDto;
  points: { volts: number; displacementNm: number; sweep?: 'up' | 'down' }[];
  expectedGainNmPerV: number | null;
  flags: PlausibilityFlag[];
  createdAt: string;
}

export interface QueuePartDto {
  id: number;
  name: string;
  category: string;
  salvageSource: string | null;
  material: string | null;
  notes: string | null;
  author: ReviewAuthorDto | null;
  createdAt: string;
}

export interface QueueReportDto {
  id: number;
  targetType: ReportTargetType;
  targetId: number;
  targetLabel: string;
  /** Where the reported thing is shown, when its type alone does not say (a comment: its build page). */
  targetPath: string | null;
  reason: ReportReason;
  note: string | null;
  reporter: ReviewAuthorDto;
  createdAt: string;
}

export interface ReviewQueueDto {
  counts: { builds: number; runs: number; parts: number; reports: number; edited: number };
  builds: QueueBuildDto[];
  runs: QueueRunDto[];
  parts: QueuePartDto[];
  reports: QueueReportDto[];
  edited: QueueBuildDto[];
}

export interface AuditEntryDto {
  id: number;
  actor: ReviewAuthorDto;
  action: string;
  targetType: string;
  targetId: number;
  /** The thing named as it was when the entry was made; null on entries from before names were kept. */
  targetLabel: string | null;
  note: string | null;
  createdAt: string;
}

export interface AuditListDto {
  items: AuditEntryDto[];
  total: number;
  page: number;
  pageSize: number;
}
