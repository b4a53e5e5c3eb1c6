import type { PartChoiceDto, PartSummaryDto } from '@shared/schemas/part.ts';
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
  return {
    id: p.id,
    name: p.name,
    category: p.category,
    status: p.status,
    salvageSource: p.salvageSource,
    material: p.material,
    safeVolts: p.safeVolts,
    capacitanceNf: p.capacitanceNf,
    stats: {
      acceptedRunCount: p.acceptedRunCount,
      buildCount: p.buildCount,
      gainMedianNmPerV: p.gainMedianNmPerV,
      gainP25NmPerV: p.gainP25NmPerV,
      gainP75NmPerV: p.gainP75NmPerV,
      gainMinNmPerV: p.gainMinNmPerV,
      gainMaxNmPerV: p.gainMaxNmPerV,
      hysteresisMedianPct: p.hysteresisMedianPct,
    },
  };
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
