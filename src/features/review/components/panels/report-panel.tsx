import { Link } from 'react-router-dom';
import { reportDecisionInput, type QueueReportDto } from '@shared/schemas/review.ts';
import { reportReasonLabels } from '@shared/schemas/review-vocabulary.ts';
import { useDecideReport } from '@/features/review/api/decide-report.ts';
import { DecisionForm } from '../decision/decision-form.tsx';
import { age, sentenceCase, targetTypeWords } from '../format.ts';
import { formatDate } from '@shared/format/dates.ts';
import { reportChoices } from './decision-choices.ts';
import { Facts, PanelFrame } from './panel-frame.tsx';
import { TargetLink } from '../target-link.tsx';

/** An open report: what it is about, why, and the reporter's note; then resolve / dismiss with what was done. */
export function ReportPanel({ report, onDecided }: { report: QueueReportDto; onDecided: (decision: string) => void }) {
  const decide = useDecideReport();
  return (
    <PanelFrame
      eyebrow={`Report on a ${targetTypeWords[report.targetType]}`}
      title={sentenceCase(report.targetLabel)}
      meta={
        <>
          reported by {report.reporter.login} · {formatDate(report.createdAt)} · {age(report.createdAt)} waiting
        </>
      }
      decision={
        <DecisionForm
          id={`report-${report.id}`}
          schema={reportDecisionInput}
          choices={reportChoices}
          noteLabel="What you did"
          noteHint="Required for both: the reporter is told the outcome with this note."
          onDecide={async (v) => {
            await decide.mutateAsync({ id: report.id, decision: v.decision, note: v.note ?? '' });
            onDecided(v.decision);
          }}
        />
      }
    >
      <Facts
        items={[
          [
            'Reported',
            report.targetPath ? (
              <Link key="t" className="text-copper underline" to={report.targetPath}>
                {sentenceCase(report.targetLabel)} (on its build; hide it there with a note)
              </Link>
            ) : (
              <TargetLink key="t" type={report.targetType} id={report.targetId}>
                {sentenceCase(report.targetLabel)}
                {report.targetType === 'run' ? ' (its build)' : ''}
              </TargetLink>
            ),
          ],
          ['Reason', reportReasonLabels[report.reason]],
          [
            'Note',
            report.note ? <span className="whitespace-pre-line">{report.note}</span> : <span className="text-ink-soft">No note.</span>,
          ],
        ]}
      />
    </PanelFrame>
  );
}
