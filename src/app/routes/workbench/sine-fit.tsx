import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { NoResult, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { RowProblems } from '@/features/workbench/components/row-problems.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { ColumnMappingFields } from '@/features/workbench/components/sine-fit/column-mapping.tsx';
import { SineFitResults } from '@/features/workbench/components/sine-fit/sine-fit-results.tsx';
import { SineLoop } from '@/features/workbench/components/sine-fit/sine-loop.tsx';
import { SinePreview } from '@/features/workbench/components/sine-fit/sine-preview.tsx';
import { SineSource } from '@/features/workbench/components/sine-fit/sine-source.tsx';
import { useSineRecord } from '@/features/workbench/components/sine-fit/use-sine-record.ts';
import { RecordRunPanel } from './record-run-panel.tsx';
import { ToolInputs } from './tool-inputs.tsx';

export function SineFitPage() {
  const record = useSineRecord();
  const { outcome, input } = record;
  return (
    <ToolPage
      slug="sine-fit"
      linkNote="the record itself is not kept in the link, only its units and the frequency"
      lead="Fit a recorded sine drive and the displacement it makes (a scope or data-logger export): gain, phase lag and the loop."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <section aria-label="Record" className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <SineSource state={record} />
            </section>
            <section aria-label="Columns and units" className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <ColumnMappingFields state={record} />
              {record.table.lines.length > 0 && (
                <>
                  <RowProblems used={record.samples.length} problems={record.problems} what="Line" noun="sample" />
                  <SinePreview state={record} />
                </>
              )}
            </section>
          </ToolInputs>
        }
        results={
          outcome.ok && input ? (
            <>
              <ResultNotesBlock r={outcome.result} />
              <SineFitResults r={outcome.result} />
              <SineLoop input={input} result={outcome.result} />
              <RecordRunPanel data={{ kind: 'sine-record', ...input }} defaultMethod="capacitive" />
              <p className="text-sm text-ink-soft">
                Read the swing off a dial instead? Use the{' '}
                <Link className="text-teal-dark underline" to={paths.workbenchTool('peak-to-peak')}>
                  peak-to-peak gain
                </Link>
                .
              </p>
            </>
          ) : (
            <NoResult message={outcome.ok ? '' : outcome.message} />
          )
        }
      />
    </ToolPage>
  );
}
