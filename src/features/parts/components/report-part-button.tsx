import { useRef, useState, type FormEvent } from 'react';
import type { ReportReason } from '@shared/schemas/review-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { ApiError } from '@/lib/api-client.ts';
import { useReportPart } from '../api/report-part.ts';
import { FormError, inputClass } from '@/components/ui/form-bits.tsx';
import { ReportReasonSelect } from '@/components/ui/report-reason-select.tsx';

const failure = (e: unknown) =>
  e instanceof ApiError && e.status === 429
    ? 'You have sent many reports in a short time; try again later.'
    : e instanceof Error
      ? e.message
      : 'The report was not sent; try again.';

/** "Report" and its small modal dialog: a reason, an optional note, sent to the moderators. */
export function ReportPartButton({ partId, partName }: { partId: number; partName: string }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const report = useReportPart();
  const [reason, setReason] = useState<ReportReason | ''>('');
  const [note, setNote] = useState('');
  const [missing, setMissing] = useState(false);

  const open = () => {
    report.reset();
    setReason('');
    setNote('');
    setMissing(false);
    dialog.current?.showModal();
  };
  const close = () => dialog.current?.close();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!reason) return setMissing(true);
    report.mutate({ targetId: partId, reason, note: note.trim() || undefined });
  };

  return (
    <>
      <Button variant="ghost" onClick={open} aria-haspopup="dialog">
        Report
      </Button>
      <dialog
        ref={dialog}
        aria-labelledby="report-title"
        className="m-auto w-[min(92vw,28rem)] rounded-lg border border-rule bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/50"
      >
        <form onSubmit={submit} className="space-y-3 p-4" noValidate>
          <h2 id="report-title" className="text-lg font-semibold">
            Report this part
          </h2>
          <p className="text-sm text-ink-soft">
            Tell the moderators what is wrong with “{partName}”. They see your handle, not your e-mail address.
          </p>
          {report.isSuccess ? (
            <p role="status" className="rounded-md border border-teal bg-white p-3 text-sm">
              Thanks: your report is with the moderators.
            </p>
          ) : (
            <>
              <div>
                <label htmlFor="report-reason" className="mb-1 block text-sm font-medium">
                  Reason
                </label>
                <ReportReasonSelect
                  id="report-reason"
                  value={reason}
                  onChange={setReason}
                  errorId={missing && !reason ? 'report-reason-error' : undefined}
                />
                {missing && !reason && (
                  <p id="report-reason-error" className="mt-1 text-sm text-danger">
                    Pick a reason.
                  </p>
                )}
              </div>
              <div>
                <label htmlFor="report-note" className="mb-1 block text-sm font-medium">
                  Note <span className="font-normal text-ink-soft">(optional)</span>
                </label>
                <textarea
                  id="report-note"
                  rows={3}
                  maxLength={4000}
                  className={inputClass}
                  value={note}
                  onChange={(e) => setNote(e.target.value)}
                />
              </div>
              <FormError message={report.isError ? failure(report.error) : undefined} />
            </>
          )}
          <div className="flex justify-end gap-2">
            <Button variant="ghost" onClick={close}>
              {report.isSuccess ? 'Close' : 'Cancel'}
            </Button>
            {!report.isSuccess && (
              <Button type="submit" disabled={report.isPending}>
                {report.isPending ? 'Sending…' : 'Send report'}
              </Button>
            )}
          </div>
        </form>
      </dialog>
    </>
  );
}
