import type { RunKind } from './run-vocabulary.ts';
import { z } from 'zod';
import { multiLine, singleLine } from './text.ts';
import type { AttachedPhotoDto } from './attached-photo.ts';
import { PART_CATEGORIES, type PartCategory, type PartStatus } from './part-vocabulary.ts';

/** Geometry in mm as far as it is known; which fields matter depends on the category. */
export interface PartGeometryDto {
  lengthMm: number | null;
  widthMm: number | null;
  thicknessMm: number | null;
  outerDiameterMm: number | null;
  wallMm: number | null;
  layers: number | null;
}

/** Pooled statistics over accepted calibration runs (nm/V; hysteresis in % of span). */
export interface PartStatsDto {
  acceptedRunCount: number;
  buildCount: number;
  gainMedianNmPerV: number | null;
  gainP25NmPerV: number | null;
  gainP75NmPerV: number | null;
  gainMinNmPerV: number | null;
  gainMaxNmPerV: number | null;
  hysteresisMedianPct: number | null;
}

/** The pooled figures of anything that carries them as columns (a part row, a registry row). */
export const partStatsOf = (p: PartStatsDto): PartStatsDto => ({
  acceptedRunCount: p.acceptedRunCount,
  buildCount: p.buildCount,
  gainMedianNmPerV: p.gainMedianNmPerV,
  gainP25NmPerV: p.gainP25NmPerV,
  gainP75NmPerV: p.gainP75NmPerV,
  gainMinNmPerV: p.gainMinNmPerV,
  gainMaxNmPerV: p.gainMaxNmPerV,
  hysteresisMedianPct: p.hysteresisMedianPct,
});

/** A part as pickers and summaries show it. */
export interface PartSummaryDto {
  id: number;
  name: string;
  category: PartCategory;
  status: PartStatus;
  salvageSource: string | null;
  material: string | null;
  safeVolts: number | null;
  capacitanceNf: number | null;
  geometry: PartGeometryDto;
  stats: PartStatsDto;
}

export const partIdParams = z.strictObject({ partId: z.coerce.number().int().positive() });

export const PART_SORTS = ['gain', '-gain', 'runs', '-runs', 'newest', 'name'] as const;
export type PartSort = (typeof PART_SORTS)[number];

const optionalNumber = (schema: z.ZodNumber) => z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().pipe(schema).optional());

/** Registry search; every filter optional. A gain range matches parts whose median lies inside it. */
export const listPartsQuery = z
  .strictObject({
    q: singleLine(100).optional(),
    category: z.enum(PART_CATEGORIES).optional(),
    gainMin: optionalNumber(z.number().min(0).max(1e7)),
    gainMax: optionalNumber(z.number().min(0).max(1e7)),
    minRuns: optionalNumber(z.number().int().min(0).max(1e6)),
    /** Rated for at least this many volts (a builder with a 60 V amplifier wants parts that take 60 V). */
    minVolts: optionalNumber(z.number().min(0).max(1e5)),
    maxVolts: optionalNumber(z.number().min(0).max(1e5)),
    /** `include`: a voltage filter keeps parts with no stated rating too (by default they are hidden and counted). */
    unrated: z.enum(['include']).optional(),
    sort: z.enum(PART_SORTS).default('name'),
    page: z.coerce.number().int().min(1).max(100_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(100).default(25),
    format: z.enum(['json', 'csv']).optional(),
  })
  .refine((v) => v.gainMin === undefined || v.gainMax === undefined || v.gainMin <= v.gainMax, {
    message: 'gainMin must not exceed gainMax.',
    path: ['gainMin'],
  })
  .refine((v) => v.minVolts === undefined || v.maxVolts === undefined || v.minVolts <= v.maxVolts, {
    message: 'minVolts must not exceed maxVolts.',
    path: ['minVolts'],
  });
export type ListPartsQuery = z.infer<typeof listPartsQuery>;

/** A part as pickers show it (no geometry): registry rows and actuators' parts both fit. */
export type PartChoiceDto = Omit<PartSummaryDto, 'geometry'>;

/**
 * A row of the registry table (and of pickers that search it): the part without geometry, with
 * its pooled figures flat at the top level. The registry search is the hottest route, so its rows
 * carry each figure once.
 */
export interface PartListItemDto extends Omit<PartChoiceDto, 'stats'>, PartStatsDto {
  createdAt: string;
}

/** A part in the shape pickers and actuators use (figures under `stats`), from a registry row or a stored part. */
export function partChoiceOf(p: Omit<PartChoiceDto, 'stats'> & PartStatsDto): PartChoiceDto {
  return {
    id: p.id,
    name: p.name,
    category: p.category,
    status: p.status,
    salvageSource: p.salvageSource,
    material: p.material,
    safeVolts: p.safeVolts,
    capacitanceNf: p.capacitanceNf,
    stats: partStatsOf(p),
  };
}

export interface PartListDto {
  items: PartListItemDto[];
  total: number;
  /** Parts that match every other filter but state no voltage rating, left out by a voltage filter (0 without one). */
  unratedHidden: number;
  page: number;
  pageSize: number;
}

const mm = z.number().positive().max(10_000).nullable().optional();
/** A maker proposes a part; it is listed once a moderator accepts it. */
export const proposePartInput = z.strictObject({
  category: z.enum(PART_CATEGORIES),
  name: singleLine(160).min(3),
  salvageSource: singleLine(240).optional(),
  material: singleLine(40).optional(),
  lengthMm: mm,
  widthMm: mm,
  thicknessMm: mm,
  outerDiameterMm: mm,
  wallMm: mm,
  layers: z.number().int().min(1).max(10_000).nullable().optional(),
  capacitanceNf: z.number().positive().max(1e9).nullable().optional(),
  safeVolts: z.number().positive().max(100_000).nullable().optional(),
  notes: multiLine(4000).trim().optional(),
});
export type ProposePartInput = z.infer<typeof proposePartInput>;

export const mergePartInput = z.strictObject({ intoPartId: z.number().int().positive(), note: multiLine(4000).trim().min(1) });
export type MergePartInput = z.infer<typeof mergePartInput>;

/** An accepted run as the part page lists it. */
export interface PartRunDto {
  id: number;
  buildId: number;
  buildTitle: string;
  maker: string;
  /** The actuator the run measured: its label (if the maker gave one) and axis. */
  actuator: { label: string | null; axis: string };
  method: string;
  kind: RunKind;
  gainNmPerV: number;
  /** Null on point runs' interval ends for peak-to-peak and sine runs, which carry a standard uncertainty instead. */
  gainCi95NmPerV: [number | null, number | null];
  gainStdUncertaintyNmPerV: number | null;
  hysteresisPctFs: number | null;
  createdAt: string;
}

export interface PartListingRefDto {
  id: number;
  kind: 'offering' | 'seeking';
  title: string;
  quantity: number;
  condition: string;
  priceLabel: string;
  region: string;
  owner: string;
}

export interface PartDetailDto extends PartSummaryDto {
  notes: string | null;
  proposedBy: string | null;
  mergedIntoId: number | null;
  createdAt: string;
  expectedGain: { gainNmPerV: number; lowNmPerV: number; highNmPerV: number; basis: string } | null;
  runs: PartRunDto[];
  listings: PartListingRefDto[];
  photos: AttachedPhotoDto[];
  /** What the viewer may do here (the server decides; the client only hides controls). */
  abilities: { editPhotos: boolean };
}

/** Counts of accepted part medians in log-spaced bins, for the range control's histogram. */
export interface GainHistogramDto {
  binsPerDecade: number;
  bins: { fromNmPerV: number; toNmPerV: number; count: number }[];
}
