import type { ReactNode } from 'react';
import type { PartDetailDto } from '@shared/schemas/part.ts';
import { assessSafety } from '@shared/workbench/safety.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { Markdown } from '@/components/ui/markdown.tsx';
import { formatShort } from '@shared/format/measured-number.ts';

const GEOMETRY: { key: keyof PartDetailDto['geometry']; label: string; unit: string }[] = [
  { key: 'lengthMm', label: 'Length', unit: 'mm' },
  { key: 'widthMm', label: 'Width', unit: 'mm' },
  { key: 'thicknessMm', label: 'Thickness', unit: 'mm' },
  { key: 'outerDiameterMm', label: 'Outer diameter', unit: 'mm' },
  { key: 'wallMm', label: 'Wall', unit: 'mm' },
  { key: 'layers', label: 'Layers', unit: '' },
];

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="grid grid-cols-[9rem_1fr] gap-2 border-b border-rule py-1.5 last:border-b-0">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className="min-w-0 text-sm">{children}</dd>
    </div>
  );
}

/** The part itself: salvage source, material, geometry, electrical figures (with the cautions above the IEC 61010-1 levels) and notes. */
export function PartFacts({ part }: { part: PartDetailDto }) {
  const geometry = GEOMETRY.filter((g) => part.geometry[g.key] !== null);
  const safety = assessSafety({
    peakV: part.safeVolts ?? undefined,
    chargeC: part.safeVolts !== null && part.capacitanceNf !== null ? part.safeVolts * part.capacitanceNf * 1e-9 : undefined,
  });
  return (
    <section aria-labelledby="part-facts-title" className="space-y-3">
      <h2 id="part-facts-title" className="text-lg font-semibold">
        The part
      </h2>
      <SafetyNotice
        cautions={safety.cautions}
        crossed={safety.crossed}
        title={safety.highVoltage ? `Hazardous voltage: this part is rated up to ${formatShort(part.safeVolts)} V` : undefined}
      />
      <dl className="rounded-lg border border-rule bg-white px-3 py-1">
        <Row label="Salvaged from">{part.salvageSource ?? <span className="text-ink-soft">not stated</span>}</Row>
        <Row label="Material family">{part.material ?? <span className="text-ink-soft">unknown</span>}</Row>
        {geometry.length > 0 ? (
          geometry.map((g) => (
            <Row key={g.key} label={g.label}>
              <span className="num">
                {formatShort(part.geometry[g.key], 4)}
                {g.unit && ` ${g.unit}`}
              </span>
            </Row>
          ))
        ) : (
          <Row label="Geometry">
            <span className="text-ink-soft">not stated</span>
          </Row>
        )}
        <Row label="Capacitance">
          {part.capacitanceNf === null ? (
            <span className="text-ink-soft">unknown</span>
          ) : (
            <span className="num">{formatShort(part.capacitanceNf)} nF</span>
          )}
        </Row>
        <Row label="Safe voltage">
          {part.safeVolts === null ? (
            <span className="text-ink-soft">unknown</span>
          ) : (
            <span className={`num ${safety.highVoltage ? 'font-semibold text-ink' : ''}`}>
              {safety.highVoltage && (
                <span aria-hidden="true" className="mr-1 text-amber">
                  ⚠
                </span>
              )}
              {formatShort(part.safeVolts)} V
            </span>
          )}
        </Row>
        {part.proposedBy && <Row label="Proposed by">{part.proposedBy}</Row>}
      </dl>
      {part.notes && (
        <div className="rounded-lg border border-rule bg-white p-3">
          <h3 className="mb-1 text-sm font-semibold">Notes</h3>
          <Markdown className="text-sm">{part.notes}</Markdown>
        </div>
      )}
    </section>
  );
}
