import { REPORT_REASONS, reportReasonLabels, type ReportReason } from '@shared/schemas/review-vocabulary.ts';
import { inputClass } from '@/components/ui/form-bits.tsx';

/** The reasons a report can give, as one select ("Choose…" first); `errorId` names the message shown when none is picked. */
export function ReportReasonSelect({
  id,
  value,
  onChange,
  errorId,
  className = inputClass,
}: {
  id: string;
  value: ReportReason | '';
  onChange: (reason: ReportReason) => void;
  errorId?: string;
  className?: string;
}) {
  return (
    <select
      id={id}
      className={className}
      value={value}
      aria-invalid={errorId ? true : undefined}
      aria-describedby={errorId}
      onChange={(e) => onChange(e.target.value as ReportReason)}
    >
      <option value="">Choose…</option>
      {REPORT_REASONS.map((r) => (
        <option key={r} value={r}>
          {reportReasonLabels[r]}
        </option>
      ))}
    </select>
  );
}
