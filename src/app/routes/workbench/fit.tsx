import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { displacementUnitLabels, voltageUnitLabels } from '@shared/units.ts';
import { paths } from '@/config/paths.ts';
import { ChartFrame } from '@/features/workbench/components/chart-frame.tsx';
import { LazyCalibrationChart } from '@/features/workbench/components/charts/lazy-charts.ts';
import { FormRadios, FormSelect } from '@/features/workbench/components/fields.tsx';
import { NoResult } from '@/features/workbench/components/results.tsx';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { CsvSource } from '@/features/workbench/fit/csv-source.tsx';
import { exampleRows, fitForm, type FitFormValues } from '@/features/workbench/fit/fit-form.ts';
import { FitResults } from '@/features/workbench/fit/fit-results.tsx';
import { PointsGrid } from '@/features/workbench/fit/points-grid.tsx';
import { RowProblems } from '@/features/workbench/components/row-problems.tsx';
import { RowsPreview } from '@/features/workbench/fit/rows-preview.tsx';
import { useFitPreview } from '@/features/workbench/fit/use-fit-preview.ts';
import { useFitUnitConversion } from '@/features/workbench/fit/use-fit-unit-conversion.ts';
import { UnitChangeQuestion } from '@/components/ui/unit-change-question.tsx';
import { friendlyError } from '@/features/workbench/form/error-map.ts';
import { useUrlInitialValues, useUrlWriteBack } from '@/features/workbench/form/use-url-inputs.ts';
import { displacementOptions, voltageOptions } from '@/features/workbench/unit-options.ts';
import { RecordRunPanel } from './record-run-panel.tsx';
import { ToolInputs } from './tool-inputs.tsx';

const defaults: FitFormValues = {
  source: 'grid',
  rows: exampleRows,
  csvText: '',
  voltageUnit: 'V',
  displacementUnit: 'nm',
  model: 'intercept',
};
/** Typed points travel in one compact param; pasted CSV text stays out of the link. */
const urlInputs = {
  skip: ['csvText'],
  grids: { rows: { param: 'pts', columns: ['volts', 'displacement', 'sweep'], short: { sweep: { up: 'u', down: 'd' } } } },
};
const sources = [
  { value: 'grid', label: 'Type points' },
  { value: 'csv', label: 'Paste or load a CSV' },
];
const models = [
  { value: 'intercept', label: 'With intercept' },
  { value: 'origin', label: 'Through the origin' },
];

export function FitPage() {
  const initial = useUrlInitialValues(fitForm, defaults, urlInputs);
  const form = useForm({ resolver: zodResolver(fitForm, { error: friendlyError }), mode: 'onChange', defaultValues: initial });
  useUrlWriteBack(form.control, fitForm, defaults, urlInputs);
  const { source, rows, checked, result } = useFitPreview(form);
  const unitChange = useFitUnitConversion(form);
  const voltsUnit = voltageUnitLabels[form.watch('voltageUnit') ?? 'V'];
  const lengthUnit = displacementUnitLabels[form.watch('displacementUnit')];
  return (
    <ToolPage
      slug="fit"
      linkNote={source === 'csv' ? 'pasted records are not kept in the link' : undefined}
      lead="Fit the gain of an actuator from a calibration run: displacement against drive voltage, up and down sweeps."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <section aria-label="Units and model" className="grid gap-3 rounded-lg border border-rule bg-white p-4 sm:grid-cols-2">
              <FormSelect form={form} name="voltageUnit" label="Voltage unit" options={voltageOptions} />
              <FormSelect form={form} name="displacementUnit" label="Displacement unit" options={displacementOptions} />
              {unitChange.pending && (
                <div className="sm:col-span-2">
                  <UnitChangeQuestion
                    unit={unitChange.pending.field === 'displacementUnit' ? lengthUnit : voltsUnit}
                    onKeep={unitChange.keep}
                    onUndo={unitChange.undo}
                  />
                </div>
              )}
              <p className="text-xs text-ink-soft sm:col-span-2">
                Changing a unit converts the typed points; pasted CSV text is asked about.
              </p>
              <div className="sm:col-span-2">
                <FormRadios form={form} name="model" legend="Fit line" options={models} />
              </div>
            </section>
            <section aria-label="Calibration points" className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <FormRadios form={form} name="source" legend="Points from" options={sources} />
              {source === 'csv' ? (
                <CsvSource form={form} />
              ) : (
                <PointsGrid form={form} voltsUnit={voltsUnit} lengthUnit={lengthUnit} problems={checked.problems} />
              )}
              <RowProblems
                used={checked.points.length}
                problems={checked.problems}
                note={checked.note}
                what={source === 'csv' ? 'Line' : 'Row'}
              />
              {source === 'csv' && <RowsPreview rows={rows} problems={checked.problems} voltsUnit={voltsUnit} lengthUnit={lengthUnit} />}
            </section>
          </ToolInputs>
        }
        results={
          result.ok ? (
            <>
              <SafetyNotice cautions={result.preview.fit.cautions} crossed={result.preview.fit.levelsCrossed} />
              <FitResults fit={result.preview.fit} />
              <ChartFrame
                label="Calibration plot"
                caption="Up sweep: copper circles; down sweep: teal triangles; the line is the least-squares fit. Long runs are thinned for drawing only."
              >
                <LazyCalibrationChart points={result.preview.plotPoints} fit={result.preview.fit} />
              </ChartFrame>
              <RecordRunPanel data={{ kind: 'points', ...result.preview.input }} defaultMethod="indicator" />
              <p className="text-sm text-ink-soft">
                Sine drive instead? Use the{' '}
                <Link className="text-teal-dark underline" to={paths.workbenchTool('peak-to-peak')}>
                  peak-to-peak gain
                </Link>
                . A step-and-hold record?{' '}
                <Link className="text-teal-dark underline" to={paths.workbenchTool('creep')}>
                  Fit its creep
                </Link>
                .
              </p>
            </>
          ) : (
            <NoResult message={result.message} />
          )
        }
      />
    </ToolPage>
  );
}
