import { lazy, Suspense, useDeferredValue, useMemo } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { PointsRunInput } from '@shared/schemas/run.ts';
import { fitCalculator } from '@shared/workbench/calculators/fit-calculator.ts';
import { pointsAboveLimit } from '@shared/workbench/safety.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import { toNm, toVolts, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { FitSummary } from './fit-summary.tsx';
import { storedRunFlags } from '@shared/review/maker-checks.ts';
import { MakerFlags } from '../record/maker-flags.tsx';
import { previewPoints, type RunFormValues } from './run-form-schema.ts';

const CalibrationChart = lazy(async () => ({ default: (await import('@/components/charts/calibration-chart.tsx')).CalibrationChart }));

/** The gain fit of the points as typed, computed in the browser with the same shared code the server uses. */
export function FitPreview({
  maxVolts,
  flagContext,
}: {
  maxVolts: number | null;
  /** The actuator's expected gain and its part's median, for the flags the review desk will raise. */
  flagContext?: { expectedGainNmPerV: number | null; partMedianNmPerV: number | null };
}) {
  const { control } = useFormContext<RunFormValues, unknown, PointsRunInput>();
  const watched = useWatch({ control, name: ['points', 'voltageUnit', 'displacementUnit', 'model'] });
  const [rows, voltageUnit, displacementUnit, model] = useDeferredValue(watched);

  const result = useMemo(() => {
    const { points, skipped } = previewPoints(rows ?? []);
    const vu = voltageUnit as VoltageUnit;
    const du = displacementUnit as DisplacementUnit;
    const chartPoints = points.map((p) => ({ volts: toVolts(p.volts, vu), displacementNm: toNm(p.displacement, du), sweep: p.sweep }));
    try {
      const fit = fitCalculator.compute({ points, voltageUnit: vu, displacementUnit: du, model: model as 'intercept' | 'origin' });
      return { fit, chartPoints, skipped, problem: null, aboveLimit: pointsAboveLimit(points, vu, maxVolts) };
    } catch (err) {
      if (!(err instanceof FitInputError)) throw err;
      const problem = err.code === 'too_few_points' ? `Enter at least 3 points to see the fit (${points.length} so far).` : err.message;
      return { fit: null, chartPoints, skipped, problem, aboveLimit: pointsAboveLimit(points, vu, maxVolts) };
    }
  }, [rows, voltageUnit, displacementUnit, model, maxVolts]);

  return (
    <section aria-label="Live fit preview" className="rounded-md border border-teal/40 bg-teal/5 p-3">
      <h4 className="font-semibold">Live preview</h4>
      {result.aboveLimit.length > 0 && (
        <p role="alert" className="mt-1 rounded-md border border-l-4 border-amber bg-amber/10 px-3 py-1.5 text-sm">
          {result.aboveLimit.length === 1 ? 'One point is' : `${result.aboveLimit.length} points are`} above this actuator's stated maximum
          of <span className="num">{maxVolts} V</span> (row{result.aboveLimit.length === 1 ? '' : 's'}{' '}
          {result.aboveLimit
            .slice(0, 5)
            .map((i) => i + 1)
            .join(', ')}
          {result.aboveLimit.length > 5 ? ', …' : ''}): either the points or the stated limit is wrong.
        </p>
      )}
      {result.fit && (
        <div className="mt-2 space-y-2">
          <SafetyNotice cautions={result.fit.cautions} crossed={result.fit.levelsCrossed} />
          {flagContext && <MakerFlags flags={storedRunFlags({ kind: 'points', fit: result.fit }, flagContext)} overLimit={null} />}
        </div>
      )}
      <div aria-live="polite" className="mt-1">
        {result.fit ? <FitSummary fit={result.fit} label="Gain (preview)" /> : <p className="text-sm text-ink-soft">{result.problem}</p>}
        {result.skipped > 0 && (
          <p className="mt-1 text-sm text-danger">
            {result.skipped} row{result.skipped === 1 ? '' : 's'} with unreadable numbers left out of the preview.
          </p>
        )}
      </div>
      {result.chartPoints.length > 0 && (
        <Suspense fallback={<p className="mt-2 text-sm text-ink-soft">Loading the plot…</p>}>
          <div className="mt-3 rounded bg-white p-1">
            <CalibrationChart
              points={result.chartPoints}
              fit={result.fit && { interceptNm: result.fit.interceptNm, gainNmPerV: result.fit.gainNmPerV }}
              height={260}
            />
          </div>
        </Suspense>
      )}
      <p className="mt-2 text-xs text-ink-soft">
        This preview is computed in your browser. The stored fit is computed by Scanwright from your points when you save the run.
      </p>
    </section>
  );
}
