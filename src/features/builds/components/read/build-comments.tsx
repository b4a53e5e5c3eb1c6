import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { BuildCommentDto } from '@shared/schemas/comment.ts';
import { MAX_COMMENT_CHARS } from '@shared/schemas/post-limits.ts';
import { formatDate } from '@shared/format/dates.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { Button } from '@/components/ui/button.tsx';
import { FormError, errorMessage, inputClass } from '@/components/ui/form-bits.tsx';
import { ApiError } from '@/lib/api-client.ts';
import { paths } from '@/config/paths.ts';
import { commentsQuery, useCreateComment, useHideComment, useReportComment } from '../../api/comments.ts';
import type { ReportReason } from '@shared/schemas/review-vocabulary.ts';
import { ReportReasonSelect } from '@/components/ui/report-reason-select.tsx';
import { MarkdownPostForm } from '@/components/ui/markdown-post-form.tsx';

const failure = (e: unknown) =>
  e instanceof ApiError && e.status === 429
    ? 'You have written many comments in a short time; try again in a few minutes.'
    : errorMessage(e);

/** A moderator's "Hide" with the note it needs, inline. */
function HideComment({ buildId, comment }: { buildId: number; comment: BuildCommentDto }) {
  const hide = useHideComment(buildId);
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  if (!open)
    return (
      <Button variant="ghost" className="text-sm" onClick={() => setOpen(true)}>
        Hide…
      </Button>
    );
  const id = `hide-note-${comment.id}`;
  return (
    <form
      className="mt-2 flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (note.trim()) hide.mutate({ commentId: comment.id, note: note.trim() });
      }}
    >
      <label htmlFor={id} className="text-sm">
        Why hide it (kept on the audit trail)
        <input id={id} className={`${inputClass} mt-1`} value={note} onChange={(e) => setNote(e.target.value)} />
      </label>
      <Button type="submit" disabled={!note.trim() || hide.isPending}>
        Hide comment
      </Button>
      <Button variant="ghost" onClick={() => setOpen(false)}>
        Cancel
      </Button>
      <FormError message={hide.error ? failure(hide.error) : undefined} />
    </form>
  );
}

/** "Report…" with a reason and an optional note, inline under the comment. */
function ReportComment({ comment }: { comment: BuildCommentDto }) {
  const report = useReportComment();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState<ReportReason | ''>('');
  const [note, setNote] = useState('');
  if (report.isSuccess)
    return (
      <p role="status" className="mt-2 text-sm text-teal-dark">
        Thanks: your report is with the moderators.
      </p>
    );
  if (!open)
    return (
      <Button variant="ghost" className="text-sm" onClick={() => setOpen(true)}>
        Report…
      </Button>
    );
  const id = `report-comment-${comment.id}`;
  return (
    <form
      className="mt-2 flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (reason) report.mutate({ targetId: comment.id, reason, note: note.trim() || undefined });
      }}
    >
      <label htmlFor={`${id}-reason`} className="text-sm">
        Reason
        <ReportReasonSelect id={`${id}-reason`} className={`${inputClass} mt-1`} value={reason} onChange={setReason} />
      </label>
      <label htmlFor={`${id}-note`} className="text-sm">
        Note for the moderators (optional)
        <input id={`${id}-note`} className={`${inputClass} mt-1`} value={note} onChange={(e) => setNote(e.target.value)} />
      </label>
      <Button type="submit" disabled={!reason || report.isPending}>
        Send report
      </Button>
      <Button variant="ghost" onClick={() => setOpen(false)}>
        Cancel
      </Button>
      <FormError message={report.error ? failure(report.error) : undefined} />
    </form>
  );
}

/** Questions and remarks on a published build: read by anyone, written by signed-in makers. */
export function BuildComments({ buildId, signedIn }: { buildId: number; signedIn: boolean }) {
  const location = useLocation();
  const comments = useQuery(commentsQuery(buildId));
  const create = useCreateComment(buildId);
  const items = comments.data?.items ?? [];
  return (
    <div className="space-y-4">
      {comments.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Loading the comments…
        </p>
      ) : items.length === 0 ? (
        <p className="text-sm text-ink-soft">No comments yet.</p>
      ) : (
        <ol className="space-y-3">
          {items.map((c) => (
            <li key={c.id} id={`comment-${c.id}`} className="rounded-lg border border-rule bg-white p-4">
              <p className="mb-2 text-xs text-ink-soft">
                <span className="font-medium text-ink">{c.author.login}</span> · <span className="num">{formatDate(c.createdAt)}</span>
              </p>
              <Markdown className="max-w-3xl text-sm [&>:first-child]:mt-0!">{c.body}</Markdown>
              <div className="flex flex-wrap gap-2">
                {c.abilities.hide && <HideComment buildId={buildId} comment={c} />}
                {c.abilities.report && <ReportComment comment={c} />}
              </div>
            </li>
          ))}
        </ol>
      )}
      {signedIn ? (
        <MarkdownPostForm
          id="comment-body"
          label="Your comment (Markdown)"
          rows={4}
          maxLength={MAX_COMMENT_CHARS}
          placeholder="Ask about the build, or say what worked for you."
          className="space-y-2 rounded-lg border border-rule bg-white p-4"
          pending={create.isPending}
          error={create.error ? failure(create.error) : undefined}
          submitLabel="Post comment"
          pendingLabel="Posting…"
          onPost={(body, stored) => create.mutate({ body }, { onSuccess: stored })}
        />
      ) : (
        <p className="text-sm">
          <a className="text-teal-dark underline" href={paths.signIn(location.pathname)}>
            Sign in
          </a>{' '}
          to ask the maker a question or add a remark.
        </p>
      )}
    </div>
  );
}
