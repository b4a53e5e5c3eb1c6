import { useState, type TextareaHTMLAttributes } from 'react';
import { Markdown } from '@/components/ui/markdown.tsx';
import { describe, Field, inputClass } from '@/components/ui/form-bits.tsx';

/** A Markdown text area with a Write / Preview switch; the text area stays mounted so the form keeps its value. */
export function MarkdownField({
  id,
  label,
  value,
  error,
  hint,
  rows = 10,
  textarea,
}: {
  id: string;
  label: string;
  value: string;
  error?: string;
  hint?: string;
  rows?: number;
  textarea: TextareaHTMLAttributes<HTMLTextAreaElement>;
}) {
  const [preview, setPreview] = useState(false);
  const tab = (on: boolean) =>
    `rounded-t-md border border-b-0 px-3 py-1 text-sm ${on ? 'border-rule bg-white font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`;
  return (
    <Field label={label} id={id} error={error} hint={hint ?? 'Markdown: # headings, **bold**, lists, links, tables.'}>
      <div role="group" aria-label={`${label}: write or preview`} className="flex gap-1">
        <button type="button" className={tab(!preview)} aria-pressed={!preview} onClick={() => setPreview(false)}>
          Write
        </button>
        <button type="button" className={tab(preview)} aria-pressed={preview} onClick={() => setPreview(true)}>
          Preview
        </button>
      </div>
      <textarea
        id={id}
        rows={rows}
        hidden={preview}
        className={`${inputClass} font-mono text-sm`}
        {...describe(id, error, true)}
        {...textarea}
      />
      {preview && (
        <div className="min-h-24 rounded-md border border-rule bg-white p-3" aria-live="polite">
          {value.trim() ? <Markdown>{value}</Markdown> : <p className="text-ink-soft">Nothing to preview yet.</p>}
        </div>
      )}
    </Field>
  );
}
