import { lazy, Suspense, useDeferredValue, useMemo } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { CreateRunInput } from '@shared/schemas/run.ts';
import { fitCalibrationInUnits, toFitResultDto } from '@shared/workbench/calibration-fit.ts';
import { FitInputError } from '@shared/workbench/fit-input-error.ts';
import { toNm, toVolts, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { FitSummary } from './fit-summary.tsx';
import { previewPoints, type RunFormValues } from './run-form-schema.ts';

const CalibrationChart = lazy(async () => ({ default: (await import('@/components/charts/calibration-chart.tsx')).CalibrationChart }));

/** The gain fit of the points as typed, computed in the browser with the same shared code the server uses. */
export function FitPreview() {
  const { control } = useFormContext<RunFormValues, unknown, CreateRunInput>();
  const watched = useWatch({ control, name: ['points', 'voltageUnit', 'displacementUnit', 'model'] });
  const [rows, voltageUnit, displacementUnit, model] = useDeferredValue(watched);

  const result = useMemo(() => {
    const { points, skipped } = previewPoints(rows ?? []);
    const vu = voltageUnit as VoltageUnit;
    const du = displacementUnit as DisplacementUnit;
    const chartPoints = points.map((p) => ({ volts: toVolts(p.volts, vu), displacementNm: toNm(p.displacement, du), sweep: p.sweep }));
    try {
      const fit = toFitResultDto(fitCalibrationInUnits({ points, voltageUnit: vu, displacementUnit: du, model: model as 'intercept' | 'origin' }));
      return { fit, chartPoints, skipped, problem: null };
    } catch (err) {
      if (!(err instanceof FitInputError)) throw err;
      const problem = err.code === 'too_few_points' ? `Enter at least 3 points to see the fit (${points.length} so far).` : err.message;
      return { fit: null, chartPoints, skipped, problem };
    }
  }, [rows, voltageUnit, displacementUnit, model]);

  return (
    <section aria-label="Live fit preview" className="rounded-md border border-teal/40 bg-teal/5 p-3">
      <h4 className="font-semibold">Live preview</h4>
      <div aria-live="polite" className="mt-1">
        {result.fit ? <FitSummary fit={result.fit} label="Gain (preview)" /> : <p className="text-sm text-ink-soft">{result.problem}</p>}
        {result.skipped > 0 && <p className="mt-1 text-sm text-danger">{result.skipped} row{result.skipped === 1 ? '' : 's'} with unreadable numbers left out of the preview.</p>}
      </div>
      {result.chartPoints.length > 0 && (
        <Suspense fallback={<p className="mt-2 text-sm text-ink-soft">Loading the plot…</p>}>
          <div className="mt-3 rounded bg-white p-1">
            <CalibrationChart points={result.chartPoints} fit={result.fit && { interceptNm: result.fit.interceptNm, gainNmPerV: result.fit.gainNmPerV }} height={260} />
          </div>
        </Suspense>
      )}
      <p className="mt-2 text-xs text-ink-soft">This preview is computed in your browser. The stored fit is computed by Scanwright from your points when you save the run.</p>
    </section>
  );
}
