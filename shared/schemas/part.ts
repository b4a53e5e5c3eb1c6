import { z } from 'zod';

export const PART_CATEGORIES = ['bimorph', 'buzzer-disc', 'stack', 'tube', 'shear-plate', 'voice-coil', 'other'] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];
export const PART_STATUSES = ['proposed', 'accepted', 'rejected'] as const;
export type PartStatus = (typeof PART_STATUSES)[number];

export const partCategoryLabels: Record<PartCategory, string> = {
  bimorph: 'Bimorph bender',
  'buzzer-disc': 'Buzzer disc',
  stack: 'Multilayer stack',
  tube: 'Piezo tube',
  'shear-plate': 'Shear plate',
  'voice-coil': 'Voice coil',
  other: 'Other',
};

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

export const listPartsQuery = z.strictObject({
  q: z.string().trim().max(100).optional(),
  category: z.enum(PART_CATEGORIES).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type ListPartsQuery = z.infer<typeof listPartsQuery>;

export interface PartListDto {
  items: PartSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}
