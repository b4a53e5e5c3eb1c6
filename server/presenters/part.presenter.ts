import { partChoiceOf } from '@shared/schemas/part.ts';
import type { RunKind } from '@shared/schemas/run-vocabulary.ts';
import type { PartChoiceDto, PartDetailDto, PartSummaryDto } from '@shared/schemas/part.ts';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { priceLabel, type PriceKind } from '@shared/schemas/listing-vocabulary.ts';
import { expectedGainForPart } from '@shared/workbench/part-expected-gain.ts';
import type { Part } from '../models/part.model.ts';

/** The columns a part summary needs: a Part instance or a plain row from the registry search. */
export type PartRow = Pick<
  Part,
  | 'id'
  | 'name'
  | 'category'
  | 'status'
  | 'salvageSource'
  | 'material'
  | 'safeVolts'
  | 'capacitanceNf'
  | 'lengthMm'
  | 'widthMm'
  | 'thicknessMm'
  | 'outerDiameterMm'
  | 'wallMm'
  | 'layers'
  | 'acceptedRunCount'
  | 'buildCount'
  | 'gainMedianNmPerV'
  | 'gainP25NmPerV'
  | 'gainP75NmPerV'
  | 'gainMinNmPerV'
  | 'gainMaxNmPerV'
  | 'hysteresisMedianPct'
  | 'createdAt'
>;

/** A part as pickers and registry rows show it: no geometry. */
export function presentPartChoice(p: PartRow): PartChoiceDto {
  return partChoiceOf(p);
}

/** A part with its geometry and pooled statistics. */
export function presentPartSummary(p: PartRow): PartSummaryDto {
  return {
    ...presentPartChoice(p),
    geometry: {
      lengthMm: p.lengthMm,
      widthMm: p.widthMm,
      thicknessMm: p.thicknessMm,
      outerDiameterMm: p.outerDiameterMm,
      wallMm: p.wallMm,
      layers: p.layers,
    },
  };
}

/** An accepted run of a part with its build's title, its actuator (label and axis) and maker, as the part page lists it. */
export interface PartRunRow {
  id: number;
  buildId: number;
  buildTitle: string | null;
  maker: string | null;
  actuatorLabel: string | null;
  axis: string | null;
  method: string;
  kind: RunKind;
  gainNmPerV: number;
  gainStdErrNmPerV: number | null;
  gainCi95LoNmPerV: number | null;
  gainCi95HiNmPerV: number | null;
  hysteresisPctFs: number | null;
  createdAt: string;
}

/** An open or reserved, unhidden listing of a part with its owner's login. */
export interface PartListingRow {
  id: number;
  kind: 'offering' | 'seeking';
  quantity: number;
  condition: string;
  priceKind: string;
  priceAmount: number | null;
  currency: string | null;
  region: string;
  owner: string | null;
}

/** What a part page shows beside the part's own row, loaded by the part service. */
export interface PartPageRows {
  proposedBy: string | null;
  runs: PartRunRow[];
  listings: PartListingRow[];
  photos: AttachedPhotoDto[];
}

/** The part page; `editPhotos` is the caller's authorization answer for this actor. */
export function presentPartDetail(part: Part, rows: PartPageRows, editPhotos: boolean): PartDetailDto {
  return {
    ...presentPartSummary(part),
    notes: part.notes,
    proposedBy: rows.proposedBy,
    mergedIntoId: part.mergedIntoId,
    createdAt: part.createdAt.toISOString(),
    expectedGain: expectedGainForPart(part, 'single'),
    runs: rows.runs.map((r) => ({
      id: r.id,
      buildId: r.buildId,
      buildTitle: r.buildTitle ?? '',
      maker: r.maker ?? 'unknown',
      actuator: { label: r.actuatorLabel, axis: r.axis ?? '' },
      method: r.method,
      kind: r.kind,
      gainNmPerV: Math.abs(r.gainNmPerV),
      gainStdUncertaintyNmPerV: r.gainStdErrNmPerV,
      gainCi95NmPerV: [r.gainCi95LoNmPerV, r.gainCi95HiNmPerV],
      hysteresisPctFs: r.hysteresisPctFs,
      createdAt: r.createdAt,
    })),
    listings: rows.listings.map((l) => ({
      id: l.id,
      kind: l.kind,
      title: `${l.kind === 'offering' ? 'Offering' : 'Seeking'} ${l.quantity} × ${part.name}`,
      quantity: l.quantity,
      condition: l.condition,
      priceLabel: priceLabel(l.priceKind as PriceKind, l.priceAmount, l.currency),
      region: l.region,
      owner: l.owner ?? 'unknown',
    })),
    photos: rows.photos,
    abilities: { editPhotos },
  };
}
