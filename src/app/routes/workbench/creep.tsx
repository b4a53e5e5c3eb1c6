import { useDeferredValue, useId, useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '@/components/ui/button.tsx';
import { UnitChangeQuestion } from '@/components/ui/unit-change-question.tsx';
import { useUnitChangeQuestion } from '@/hooks/use-unit-conversion.ts';
import { displacementUnitLabels } from '@shared/units.ts';
import { ChartFrame } from '@/features/workbench/components/chart-frame.tsx';
import { LazyCreepChart } from '@/features/workbench/components/charts/lazy-charts.ts';
import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { NoResult } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { creepForm, exampleRecord, previewCreep, type CreepFormValues } from '@/features/workbench/creep/creep-form.ts';
import { CreepResults } from '@/features/workbench/creep/creep-results.tsx';
import { RowProblems } from '@/features/workbench/components/row-problems.tsx';
import { friendlyError } from '@/features/workbench/form/error-map.ts';
import { useUrlInitialValues, useUrlWriteBack } from '@/features/workbench/form/use-url-inputs.ts';
import { displacementOptions } from '@/features/workbench/unit-options.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults: CreepFormValues = { text: exampleRecord, unit: 'nm', projectToS: 3600 };
const urlInputs = { skip: ['text'] };

export function CreepPage() {
  const textId = useId();
  const initial = useUrlInitialValues(creepForm, defaults, urlInputs);
  const form = useForm({ resolver: zodResolver(creepForm, { error: friendlyError }), mode: 'onChange', defaultValues: initial });
  useUrlWriteBack(form.control, creepForm, defaults, urlInputs);
  const [text, unit, projectToS] = useWatch({ control: form.control, name: ['text', 'unit', 'projectToS'] });
  const deferredText = useDeferredValue(text);
  const unitChange = useUnitChangeQuestion(form, 'unit');
  const r = useMemo(() => previewCreep(deferredText ?? '', unit, projectToS), [deferredText, unit, projectToS]);
  return (
    <ToolPage
      slug="creep"
      linkNote="pasted records are not kept in the link"
      lead="After a voltage step a piezo keeps moving for minutes. Fit the logarithmic creep law to a step-and-hold record."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Step-and-hold record">
              <div className="space-y-1 sm:col-span-2">
                <label htmlFor={textId} className="block text-sm font-medium">
                  Samples (CSV: time in s, displacement)
                </label>
                <textarea
                  id={textId}
                  rows={9}
                  spellCheck={false}
                  aria-describedby={`${textId}-hint`}
                  className="num w-full rounded-md border border-rule bg-white px-2 py-1.5 text-sm"
                  {...form.register('text')}
                />
                <p id={`${textId}-hint`} className="text-xs text-ink-soft">
                  Time since the step, then the reading; header optional. The example is illustrative — replace it with yours.
                </p>
                <div className="flex gap-2">
                  <Button variant="ghost" onClick={() => form.setValue('text', '')}>
                    Clear
                  </Button>
                  <Button variant="ghost" onClick={() => form.setValue('text', exampleRecord)}>
                    Load the example
                  </Button>
                </div>
              </div>
              <FormSelect form={form} name="unit" label="Displacement unit" options={displacementOptions} />
              {unitChange.pending && (
                <div className="sm:col-span-2">
                  <UnitChangeQuestion unit={displacementUnitLabels[unit ?? 'nm']} onKeep={unitChange.keep} onUndo={unitChange.undo} />
                </div>
              )}
              <FormNumber form={form} name="projectToS" label="Project to" unit="s" optional />
              <div className="sm:col-span-2">
                <RowProblems used={r.used} problems={r.problems} what="Line" noun="sample" />
              </div>
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r.ok ? (
            <>
              <CreepResults fit={r.fit} projections={r.projections} />
              <ChartFrame label="Creep plot" caption="Samples (copper) and the fitted creep law (ink line), time on a logarithmic axis.">
                <LazyCreepChart samples={r.samples} curve={r.curve} />
              </ChartFrame>
            </>
          ) : (
            <NoResult message={r.message} />
          )
        }
      />
    </ToolPage>
  );
}
