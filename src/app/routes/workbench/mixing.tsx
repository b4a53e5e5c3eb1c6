import { useWatch } from 'react-hook-form';
import { ChartFrame } from '@/features/workbench/components/chart-frame.tsx';
import { LazyMixerChart } from '@/features/workbench/components/charts/lazy-charts.ts';
import { FieldGroup, FormNumber, errorOf } from '@/features/workbench/components/fields.tsx';
import { NoResult, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { GainMatrixFields } from '@/features/workbench/mixing/gain-matrix-fields.tsx';
import { GridFitPanel } from '@/features/workbench/mixing/grid-fit-panel.tsx';
import { driveMatrixFromForm, mixingForm, type MixingFormValues } from '@/features/workbench/mixing/mixing-form.ts';
import { mixingCalculator } from '@shared/workbench/calculators/mixing-calculators.ts';
import { MixingResults } from '@/features/workbench/mixing/mixing-results.tsx';
import { PairPreset } from '@/features/workbench/mixing/pair-preset.tsx';
import { SaveDriveMatrixPanel } from './start-pickers.tsx';
import { ToolInputs } from './tool-inputs.tsx';

const defaults: MixingFormValues = {
  gain: [
    [70.7107, -70.7107],
    [70.7107, 70.7107],
  ],
  limits: { vaMinV: -15, vaMaxV: 15, vbMinV: -15, vbMaxV: 15 },
  targetXNm: 500,
  targetYNm: 1200,
};

export function MixingPage() {
  const { form, live } = useLiveForm(mixingForm, defaults, mixingCalculator.compute);
  const limitsError = errorOf(form, 'limits');
  const values = useWatch({ control: form.control }) as MixingFormValues;
  const matrix = live.ok ? driveMatrixFromForm(values) : null;
  return (
    <ToolPage
      slug="mixing"
      linkNote="pasted records are not kept in the link (a pasted grid included)"
      lead="Two benders meeting at one tip: the drive matrix, the volts for a wanted x, y, and the region the limits allow."
    >
      <ToolColumns
        inputs={
          <ToolInputs start="mixing" parts={false}>
            <fieldset className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <legend className="px-1 text-sm font-semibold">Gain matrix</legend>
              <GainMatrixFields form={form} />
              <PairPreset form={form} />
              <GridFitPanel form={form} />
            </fieldset>
            <FieldGroup
              legend="Drive limits"
              pairs
              note={
                limitsError ? <span className="font-medium text-danger">{limitsError}</span> : 'What the amplifier may put on each bender.'
              }
            >
              <FormNumber form={form} name="limits.vaMinV" label="Va minimum" unit="V" />
              <FormNumber form={form} name="limits.vaMaxV" label="Va maximum" unit="V" />
              <FormNumber form={form} name="limits.vbMinV" label="Vb minimum" unit="V" />
              <FormNumber form={form} name="limits.vbMaxV" label="Vb maximum" unit="V" />
            </FieldGroup>
            <FieldGroup
              legend="Offsets x₀, y₀"
              pairs
              note={`Where the indicator reads the rest position; a grid fit with offsets fills them. Saved with the matrix (${
                (values.model ?? (values.offsetXNm || values.offsetYNm ? 'affine' : 'origin')) === 'affine'
                  ? 'fit with offsets'
                  : 'through the origin'
              }).`}
            >
              <FormNumber form={form} name="offsetXNm" label="x₀" unit="nm" optional />
              <FormNumber form={form} name="offsetYNm" label="y₀" unit="nm" optional />
            </FieldGroup>
            <FieldGroup legend="Wanted point" pairs>
              <FormNumber form={form} name="targetXNm" label="x" unit="nm" optional />
              <FormNumber form={form} name="targetYNm" label="y" unit="nm" optional />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          live.ok ? (
            <>
              <ResultNotesBlock r={live.result} />
              <MixingResults r={live.result} />
              <ChartFrame
                label="Reachable region"
                caption="Teal: every tip position the drive limits allow. The wanted point is a copper dot when reachable, a red cross when not; the black dot is the origin."
              >
                <LazyMixerChart region={live.result.regionNm} target={live.result.target} />
              </ChartFrame>
              <SaveDriveMatrixPanel matrix={matrix} />
            </>
          ) : (
            <NoResult message={live.message} />
          )
        }
      />
    </ToolPage>
  );
}
