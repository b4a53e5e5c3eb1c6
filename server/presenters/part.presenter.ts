import type { PartSummaryDto } from '@shared/schemas/part.ts';
import type { Part } from '../models/part.model.ts';

/** A part with its geometry and pooled statistics. */
export function presentPartSummary(p: Part): PartSummaryDto {
  return {
    id: p.id,
    name: p.name,
    category: p.category,
    status: p.status,
    salvageSource: p.salvageSource,
    material: p.material,
    safeVolts: p.safeVolts,
    capacitanceNf: p.capacitanceNf,
    geometry: {
      lengthMm: p.lengthMm,
      widthMm: p.widthMm,
      thicknessMm: p.thicknessMm,
      outerDiameterMm: p.outerDiameterMm,
      wallMm: p.wallMm,
      layers: p.layers,
    },
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
