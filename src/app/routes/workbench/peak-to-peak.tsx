import { convertDisplacement, displacementUnitLabels } from '@shared/units.ts';
import { peakToPeakCalculator } from '@shared/workbench/calculators/peak-to-peak-calculator.ts';
import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { Gain, Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { useUnitConversion } from '@/hooks/use-unit-conversion.ts';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { peakToPeakForm, peakToPeakLengthFields } from '@/features/workbench/simple/peak-to-peak-form.ts';
import { displacementOptions } from '@/features/workbench/unit-options.ts';
import { RecordRunPanel } from './record-run-panel.tsx';
import type { RunRecordData } from '@shared/schemas/run.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = { unit: 'um', displacementPp: 2, displacementResolution: 0.1, voltsPpV: 20 } as const;

export function PeakToPeakPage() {
  const { form, live } = useLiveForm(peakToPeakForm, defaults, peakToPeakCalculator.compute);
  useUnitConversion(form, 'unit', peakToPeakLengthFields, convertDisplacement);
  const unit = displacementUnitLabels[form.watch('unit') ?? 'nm'];
  const r = live.ok ? live.result : null;
  const v = form.watch();
  const record: RunRecordData | null = r
    ? {
        kind: 'peak-to-peak',
        displacementPp: Number(v.displacementPp),
        voltsPp: Number(v.voltsPpV),
        displacementUnit: v.unit ?? 'nm',
        voltageUnit: 'V',
        displacementResolution: Number(v.displacementResolution),
        ...(v.voltsResolutionV !== undefined && v.voltsResolutionV !== null && String(v.voltsResolutionV) !== ''
          ? { voltsResolution: Number(v.voltsResolutionV) }
          : {}),
      }
    : null;
  return (
    <ToolPage
      slug="peak-to-peak"
      lead="Drive the actuator with a slow sine and read the swing at its peaks: one gain, good to the reading resolution."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Displacement reading">
              <FormSelect
                form={form}
                name="unit"
                label="Indicator reads in"
                options={displacementOptions}
                hint="Changing it converts the numbers below."
              />
              <FormNumber form={form} name="displacementPp" label="Peak-to-peak swing Δx" unit={unit} />
              <FormNumber
                form={form}
                name="displacementResolution"
                label="Reading resolution"
                unit={unit}
                hint="Smallest division you can read."
              />
            </FieldGroup>
            <FieldGroup legend="Drive">
              <FormNumber form={form} name="voltsPpV" label="Peak-to-peak voltage ΔV" unit="V" />
              <FormNumber form={form} name="voltsResolutionV" label="Voltage resolution" unit="V" optional />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <ResultNotesBlock r={r} />
              <ResultPanel
                headline={
                  <Headline label="Gain" sub="± standard uncertainty (k = 1, GUM) from the reading resolution.">
                    <Gain value={r.gainNmPerV} plusMinus={r.gainStdUncNmPerV} kind="std" />
                  </Headline>
                }
                basis={
                  'gain = Δx_pp / ΔV_pp (common practice); each reading rectangular within ± half a division, so the difference ' +
                  'of two readings has u = r/√6, relative uncertainties in quadrature (Source: GUM, JCGM 100:2008, 4.3.7 and ' +
                  '5.1.2).'
                }
              >
                <ResultRow label="Relative uncertainty">
                  <Quantity q={{ value: formatSig(r.gainRelStdUnc * 100, 3), unit: '%' }} />
                </ResultRow>
                <ResultRow
                  label="Worst-case bounds"
                  note="Each reading off by half a division in the unlucky direction, so each swing off by one division."
                >
                  <span className="whitespace-nowrap">
                    <span className="num">
                      {formatSig(r.gainBoundsNmPerV[0])} – {formatSig(r.gainBoundsNmPerV[1])}
                    </span>{' '}
                    nm/V
                  </span>
                </ResultRow>
              </ResultPanel>
              <RecordRunPanel data={record} defaultMethod="indicator" />
            </>
          ) : (
            <NoResult message={live.ok ? '' : live.message} />
          )
        }
      />
    </ToolPage>
  );
}
