import { useRef, useState, type Ref, type TextareaHTMLAttributes } from 'react';
import type { PhotoDto } from '@shared/schemas/build.ts';
import { insertSnippet, type Snippet } from '@shared/format/markdown-insert.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { describe, Field, inputClass } from '@/components/ui/form-bits.tsx';

type TextareaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> };

/** Put a new value into a form-registered text area so its form sees a real edit (React tracks the native setter). */
function setNativeValue(el: HTMLTextAreaElement, value: string) {
  Object.getOwnPropertyDescriptor(HTMLTextAreaElement.prototype, 'value')!.set!.call(el, value);
  el.dispatchEvent(new Event('input', { bubbles: true }));
}

const toolClass = 'rounded border border-rule bg-white px-2 py-0.5 text-xs font-medium text-ink hover:border-copper hover:text-copper-dark';

/**
 * Markdown text beside its rendering: side by side on wide screens, one at a time on a phone ("Text" / "As readers
 * see it"). A small toolbar adds headings, lists, a table of figures and the build's own photos at the cursor.
 */
export function MarkdownField({
  id,
  label,
  value,
  error,
  hint,
  rows = 10,
  textarea,
  photos = [],
}: {
  id: string;
  label: string;
  value: string;
  error?: string;
  hint?: string;
  rows?: number;
  textarea: TextareaProps;
  /** The build's photos, offered by the toolbar's "Photo" menu. */
  photos?: readonly PhotoDto[];
}) {
  const box = useRef<HTMLTextAreaElement | null>(null);
  const [phoneView, setPhoneView] = useState<'text' | 'rendered'>('text');
  const [picking, setPicking] = useState(false);
  const { ref: formRef, ...fieldProps } = textarea;
  const setRef = (el: HTMLTextAreaElement | null) => {
    box.current = el;
    if (typeof formRef === 'function') formRef(el);
    else if (formRef) (formRef as { current: HTMLTextAreaElement | null }).current = el;
  };
  const apply = (snippet: Snippet) => {
    const el = box.current;
    if (!el) return;
    const edit = insertSnippet(el.value, el.selectionStart, el.selectionEnd, snippet);
    setNativeValue(el, edit.text);
    el.focus();
    el.setSelectionRange(edit.selectionStart, edit.selectionEnd);
    setPicking(false);
  };
  const viewButton = (v: 'text' | 'rendered', text: string) => (
    <button
      type="button"
      aria-pressed={phoneView === v}
      onClick={() => setPhoneView(v)}
      className={`rounded-full px-3 py-0.5 text-xs font-medium ${phoneView === v ? 'bg-teal-dark text-white' : 'text-ink-soft'}`}
    >
      {text}
    </button>
  );
  return (
    <Field label={label} id={id} error={error} hint={hint ?? 'Markdown: # headings, **bold**, lists, links, tables.'}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div role="toolbar" aria-label={`${label}: insert`} className="flex flex-wrap gap-1">
          <button type="button" className={toolClass} onClick={() => apply({ kind: 'heading' })} title="Make the selected lines a heading">
            Heading
          </button>
          <button type="button" className={toolClass} onClick={() => apply({ kind: 'list' })} title="Make the selected lines a list">
            List
          </button>
          <button type="button" className={toolClass} onClick={() => apply({ kind: 'table' })} title="A table for figures">
            Table
          </button>
          {photos.length > 0 && (
            <button type="button" className={toolClass} aria-expanded={picking} onClick={() => setPicking((p) => !p)}>
              Photo…
            </button>
          )}
        </div>
        <div role="group" aria-label={`${label}: show`} className="flex rounded-full border border-rule bg-white p-0.5 md:hidden">
          {viewButton('text', 'Text')}
          {viewButton('rendered', 'As readers see it')}
        </div>
      </div>
      {picking && (
        <ul aria-label="The build's photos" className="flex flex-wrap gap-2 rounded-md border border-rule bg-white p-2">
          {photos.map((p) => (
            <li key={p.id}>
              <button
                type="button"
                className="block w-24 rounded border border-transparent p-1 text-left text-xs hover:border-copper"
                onClick={() => apply({ kind: 'image', url: p.url, alt: p.alt })}
              >
                <img src={p.thumbUrl} alt="" className="aspect-square w-full rounded object-cover" />
                <span className="line-clamp-2">{p.alt}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <div className="grid gap-3 md:grid-cols-2">
        <textarea
          id={id}
          ref={setRef}
          rows={rows}
          className={`${inputClass} font-mono text-sm ${phoneView === 'rendered' ? 'max-md:hidden' : ''}`}
          {...describe(id, error, true)}
          {...fieldProps}
        />
        <div
          aria-label={`${label} as readers see it`}
          role="region"
          className={`min-h-24 overflow-auto rounded-md border border-dashed border-rule bg-white p-3 md:max-h-[36rem] ${phoneView === 'text' ? 'max-md:hidden' : ''}`}
        >
          {value.trim() ? (
            <Markdown>{value}</Markdown>
          ) : (
            <p className="text-sm text-ink-soft">What you write shows here as readers will see it.</p>
          )}
        </div>
      </div>
    </Field>
  );
}
