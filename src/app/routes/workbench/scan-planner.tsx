import { ChartFrame } from '@/features/workbench/components/chart-frame.tsx';
import { LazyScanChart } from '@/features/workbench/components/charts/lazy-charts.ts';
import { FieldGroup, FormNumber } from '@/features/workbench/components/fields.tsx';
import { NoResult } from '@/features/workbench/components/results.tsx';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { scanForm, type ScanPlan } from '@/features/workbench/scan/scan-form.ts';
import { scanPlanCalculator } from '@shared/workbench/calculators/scan-plan-calculator.ts';
import { ScanResults } from '@/features/workbench/scan/scan-results.tsx';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = {
  dacBits: 16,
  dacSpanV: 10,
  ampGainVPerV: 30,
  actuatorGainNmPerV: 102.6,
  pixelsPerLine: 256,
  lines: 256,
  lineRateHz: 1,
  scanSizeNm: 5000,
  resonanceKhz: 1.89,
};

/** The shared calculator's result, with the parsed plan the chart marks. */
const computePlan = (plan: ScanPlan) => ({ plan, r: scanPlanCalculator.compute(plan) });

export function ScanPlannerPage() {
  const { form, live } = useLiveForm(scanForm, defaults, computePlan);
  return (
    <ToolPage slug="scan-planner" lead="From DAC code to tip motion: the smallest step, the range, and how fast a frame can go.">
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Drive chain">
              <FormNumber form={form} name="dacBits" label="DAC resolution" unit="bit" step="1" />
              <FormNumber
                form={form}
                name="dacSpanV"
                label="DAC output span"
                unit="V"
                hint="Full swing, e.g. 10 for 0–10 V or 20 for ±10 V."
              />
              <FormNumber form={form} name="ampGainVPerV" label="Amplifier gain" unit="V/V" />
              <FormNumber form={form} name="actuatorGainNmPerV" label="Actuator gain" unit="nm/V" hint="Measured, from a gain fit." />
            </FieldGroup>
            <FieldGroup legend="Raster">
              <FormNumber form={form} name="pixelsPerLine" label="Pixels per line" step="1" />
              <FormNumber form={form} name="lines" label="Lines per frame" step="1" />
              <FormNumber form={form} name="lineRateHz" label="Line rate" unit="Hz" hint="Trace and retrace together." />
              <FormNumber form={form} name="scanSizeNm" label="Scan size" unit="nm" optional />
            </FieldGroup>
            <FieldGroup legend="Limits">
              <FormNumber
                form={form}
                name="resonanceKhz"
                label="First resonance f₀"
                unit="kHz"
                optional
                hint="From the resonance page or a measurement."
              />
              <FormNumber form={form} name="wantedStepNm" label="Wanted step" unit="nm" optional />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          live.ok ? (
            <>
              <SafetyNotice cautions={live.result.r.cautions} crossed={live.result.r.levelsCrossed} />
              <ScanResults r={live.result.r} plan={live.result.plan} />
              <ChartFrame
                label="Step against DAC bits"
                caption="Copper dot: your DAC. Each extra bit halves the step; the range stays the same."
              >
                <LazyScanChart
                  steps={live.result.r.steps}
                  bits={live.result.plan.dacBits}
                  wantedStepNm={live.result.plan.wantedStepNm}
                  pixelNm={live.result.r.pixelNm ?? undefined}
                />
              </ChartFrame>
            </>
          ) : (
            <NoResult message={live.message} />
          )
        }
      />
    </ToolPage>
  );
}
