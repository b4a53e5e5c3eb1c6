import { z } from 'zod';
import { multiLine, singleLine } from './text.ts';
import { altText } from './alt-text.ts';
import type { ActuatorDto } from './actuator.ts';

import { INSTRUMENT_KINDS, BUILD_STAGES, type InstrumentKind, type BuildStage, type BuildStatus } from './build-vocabulary.ts';

const title = singleLine(160).min(3, 'At least 3 characters.');
const summary = multiLine(600).trim().min(1, 'Say in a sentence what this build is.');
const markdown = multiLine(200_000);

export const createBuildInput = z.strictObject({
  title,
  instrumentKind: z.enum(INSTRUMENT_KINDS),
  summary,
  body: markdown.optional(),
  stage: z.enum(BUILD_STAGES).optional(),
});
export type CreateBuildInput = z.infer<typeof createBuildInput>;

export const updateBuildInput = z
  .strictObject({
    title: title.optional(),
    instrumentKind: z.enum(INSTRUMENT_KINDS).optional(),
    summary: summary.optional(),
    body: markdown.optional(),
    stage: z.enum(BUILD_STAGES).optional(),
    coverPhotoId: z.number().int().positive().nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdateBuildInput = z.infer<typeof updateBuildInput>;

export const listBuildsQuery = z.strictObject({
  q: singleLine(100).optional(),
  kind: z.enum(INSTRUMENT_KINDS).optional(),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(50).default(12),
});
export type ListBuildsQuery = z.infer<typeof listBuildsQuery>;

export const buildIdParams = z.strictObject({ buildId: z.coerce.number().int().positive() });
export const entryParams = z.strictObject({ buildId: z.coerce.number().int().positive(), entryId: z.coerce.number().int().positive() });

const isoDate = z.iso.date();
export const createEntryInput = z.strictObject({ entryDate: isoDate, title, body: markdown.min(1, 'Write something.') });
export type CreateEntryInput = z.infer<typeof createEntryInput>;
export const updateEntryInput = z
  .strictObject({ entryDate: isoDate.optional(), title: title.optional(), body: markdown.min(1).optional() })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdateEntryInput = z.infer<typeof updateEntryInput>;

export interface PhotoDto {
  id: number;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
  alt: string;
  entryId: number | null;
  position: number;
}

export interface LogEntryDto {
  id: number;
  entryDate: string;
  title: string;
  body: string;
  photos: PhotoDto[];
}

export interface BuildOwnerDto {
  id: number;
  login: string;
  name: string | null;
}

/** Key measured gains for cards: one per actuator with a run. */
export interface BuildGainDto {
  actuatorId: number;
  axis: string;
  partName: string;
  gainNmPerV: number;
  runStatus: string;
}

export interface BuildSummaryDto {
  id: number;
  title: string;
  instrumentKind: InstrumentKind;
  summary: string;
  stage: BuildStage;
  status: BuildStatus;
  owner: BuildOwnerDto;
  cover: PhotoDto | null;
  gains: BuildGainDto[];
  editedSinceReview: boolean;
  /** The review desk's note: for the owner and moderators, or anyone when the moderator made a publish note public. */
  reviewNote: string | null;
  reviewNotePublic: boolean;
  createdAt: string;
  updatedAt: string;
  publishedAt: string | null;
}

export interface BuildDto extends BuildSummaryDto {
  body: string;
  photos: PhotoDto[];
  entries: LogEntryDto[];
  actuators: ActuatorDto[];
  abilities: { edit: boolean; submit: boolean; withdraw: boolean; delete: boolean };
}

export interface BuildListDto {
  items: BuildSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

export const updatePhotoInput = z
  .strictObject({
    alt: altText.optional(),
    entryId: z.number().int().positive().nullable().optional(),
    position: z.number().int().min(0).max(10_000).optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdatePhotoInput = z.infer<typeof updatePhotoInput>;
export const photoParams = z.strictObject({ buildId: z.coerce.number().int().positive(), photoId: z.coerce.number().int().positive() });
export const reorderPhotosInput = z.strictObject({ photoIds: z.array(z.number().int().positive()).min(1).max(500) });
