import { displacementUnitLabels } from '@shared/units.ts';
import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { Gain, Headline, NoResult, Quantity, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSig } from '@/features/workbench/format.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { computePeakToPeak, peakToPeakForm } from '@/features/workbench/simple/peak-to-peak-form.ts';
import { displacementOptions } from '@/features/workbench/unit-options.ts';

const defaults = { unit: 'um', displacementPp: 2, displacementResolution: 0.1, voltsPpV: 20 } as const;

export function PeakToPeakPage() {
  const { form, live } = useLiveForm(peakToPeakForm, defaults, computePeakToPeak);
  const unit = displacementUnitLabels[form.watch('unit') ?? 'nm'];
  const r = live.ok ? live.result : null;
  return (
    <ToolPage slug="peak-to-peak" lead="Drive the actuator with a slow sine and read the swing at its peaks: one gain, good to the reading resolution.">
      <ToolColumns
        inputs={
          <form noValidate onSubmit={(e) => e.preventDefault()} className="space-y-4">
            <FieldGroup legend="Displacement reading">
              <FormSelect form={form} name="unit" label="Indicator reads in" options={displacementOptions} />
              <FormNumber form={form} name="displacementPp" label="Peak-to-peak swing Δx" unit={unit} />
              <FormNumber form={form} name="displacementResolution" label="Reading resolution" unit={unit} hint="Smallest division you can read." />
            </FieldGroup>
            <FieldGroup legend="Drive">
              <FormNumber form={form} name="voltsPpV" label="Peak-to-peak voltage ΔV" unit="V" />
              <FormNumber form={form} name="voltsResolutionV" label="Voltage resolution" unit="V" optional />
            </FieldGroup>
          </form>
        }
        results={
          r ? (
            <ResultPanel
              headline={<Headline label="Gain" sub="± standard uncertainty (k = 1) from the reading resolution."><Gain value={r.gainNmPerV} plusMinus={r.gainStdUncNmPerV} /></Headline>}
              basis="gain = Δx_pp / ΔV_pp [practice]; each reading rectangular within ± half a division, u(Δ) = r/√6, relative uncertainties in quadrature (GUM, JCGM 100:2008) [memory]."
            >
              <ResultRow label="Relative uncertainty"><Quantity q={{ value: formatSig(r.gainRelStdUnc * 100, 3), unit: '%' }} /></ResultRow>
              <ResultRow label="Worst-case bounds" note="Both readings off by a full division in the unlucky direction.">
                <span className="whitespace-nowrap"><span className="num">{formatSig(r.gainBoundsNmPerV[0])} – {formatSig(r.gainBoundsNmPerV[1])}</span> nm/V</span>
              </ResultRow>
            </ResultPanel>
          ) : (
            <NoResult message={live.ok ? '' : live.message} />
          )
        }
      />
    </ToolPage>
  );
}
