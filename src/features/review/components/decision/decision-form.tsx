import { useRef, useState } from 'react';
import type { z } from 'zod';
import { Button } from '@/components/ui/button.tsx';
import { decisionErrorMessage, noteIssue } from './decision-errors.ts';

/** One decision button: the value sent, its words, its look, and whether the note must say why. */
export interface DecisionChoice<D extends string> {
  decision: D;
  label: string;
  /** The words once a note is written, e.g. "Accept with note": the note goes to the maker without refusing anything. */
  withNoteLabel?: string;
  busyLabel: string;
  variant: 'primary' | 'secondary' | 'danger';
}

interface Values<D extends string> {
  decision: D;
  note?: string;
  notePublic?: boolean;
}

/**
 * The note box and the decision buttons of one desk item, validated with the shared zod schema
 * (which says which decisions need a note); the server's refusal shows under the buttons. Two fields in plain state:
 * the desk does not load a form library for them.
 */
export function DecisionForm<D extends string>({
  id,
  schema,
  choices,
  noteLabel,
  noteHint,
  publicNote,
  noteRows = 3,
  label = 'Decision',
  onDecide,
}: {
  id: string;
  schema: z.ZodType<Values<D>, Values<string>>;
  choices: DecisionChoice<D>[];
  noteLabel: string;
  noteHint: string;
  /** Offer "show this note to everyone" for this decision (a build's publish note); otherwise notes stay private. */
  publicNote?: { decision: D; label: string };
  /** Height of the note box; a run's form inside a build panel uses a small one. */
  noteRows?: number;
  /** The form's name (a landmark): unique on the page, e.g. one run's decision inside a build panel. */
  label?: string;
  onDecide: (values: Values<D>) => Promise<unknown>;
}) {
  const [note, setNote] = useState('');
  const [notePublic, setNotePublic] = useState(false);
  const [noteError, setNoteError] = useState<string | null>(null);
  const [serverError, setServerError] = useState<string | null>(null);
  const [busy, setBusy] = useState<D | null>(null);
  const noteBox = useRef<HTMLTextAreaElement>(null);
  const noteId = `${id}-note`;
  const hasNote = Boolean(note.trim());
  const refuseNote = (message: string) => {
    setNoteError(message);
    noteBox.current?.focus();
  };

  const decide = async (decision: D) => {
    setServerError(null);
    const parsed = schema.safeParse({ decision, note, notePublic });
    if (!parsed.success) {
      const issue = parsed.error.issues.find((i) => i.path[0] === 'note') ?? parsed.error.issues[0];
      if (issue?.path[0] === 'note') refuseNote(issue.message);
      else setServerError(issue?.message ?? 'This decision cannot be sent.');
      return;
    }
    setNoteError(null);
    const values = parsed.data;
    setBusy(decision);
    try {
      const shareNote = Boolean(values.note && values.notePublic && values.decision === publicNote?.decision);
      await onDecide({
        decision: values.decision,
        ...(values.note ? { note: values.note } : {}),
        ...(shareNote ? { notePublic: true } : {}),
      });
    } catch (err) {
      const issue = noteIssue(err);
      if (issue) refuseNote(issue);
      else setServerError(decisionErrorMessage(err));
    } finally {
      setBusy(null);
    }
  };

  return (
    <form
      noValidate
      onSubmit={(e) => e.preventDefault()}
      className="space-y-3 rounded-lg border border-rule bg-paper-deep/60 p-3"
      aria-label={label}
    >
      <div>
        <label htmlFor={noteId} className="mb-1 block text-sm font-medium">
          {noteLabel}
        </label>
        <textarea
          id={noteId}
          rows={noteRows}
          className="w-full rounded-md border border-rule bg-white px-2 py-1.5 text-base aria-[invalid=true]:border-danger"
          aria-invalid={noteError ? true : undefined}
          aria-describedby={noteError ? `${noteId}-error` : `${noteId}-hint`}
          ref={noteBox}
          value={note}
          onChange={(e) => {
            setNote(e.target.value);
            if (noteError) setNoteError(null);
          }}
        />
        {noteError ? (
          <p id={`${noteId}-error`} className="mt-1 text-sm text-danger">
            {noteError}
          </p>
        ) : (
          <p id={`${noteId}-hint`} className="mt-1 text-xs text-ink-soft">
            {noteHint}
          </p>
        )}
      </div>
      {publicNote && (
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" checked={notePublic} onChange={(e) => setNotePublic(e.target.checked)} />
          <span>{publicNote.label}</span>
        </label>
      )}
      <div className="flex flex-wrap gap-2">
        {choices.map((c) => (
          <Button key={c.decision} variant={c.variant} disabled={busy !== null} onClick={() => void decide(c.decision)}>
            {busy === c.decision ? c.busyLabel : hasNote && c.withNoteLabel ? c.withNoteLabel : c.label}
          </Button>
        ))}
      </div>
      {serverError && (
        <p role="alert" className="rounded-md border border-danger bg-danger/5 px-3 py-2 text-sm text-danger">
          {serverError}
        </p>
      )}
    </form>
  );
}
