import { useId, useState, type ClipboardEvent, type ComponentProps, type ReactNode } from 'react';
import { flushSync } from 'react-dom';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';

/** Texts longer than this stay out of the text box: a browser lays out megabytes of text slowly, and nobody reads them there. */
const LARGE_TEXT = 200_000;

function lineCount(text: string): number {
  let n = text.length > 0 && !text.endsWith('\n') ? 1 : 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

/**
 * Paste CSV text, or load a file into the same box (read in the browser; nothing is uploaded). `textarea` wires the
 * box to its form (a react-hook-form `register`, or value and onChange); `onFileText` puts a loaded file's text there.
 * A paste or file over 200 000 characters replaces the whole text and is held out of the box (a line saying how many
 * lines, "Show as text" and "Clear"), so pasting 100 000 points stays quick; the form has the text all the same.
 */
export function CsvTextSource({
  rows,
  placeholder,
  hint,
  maxBytes,
  tooLarge,
  textarea,
  onFileText,
}: {
  rows: number;
  placeholder: string;
  hint: ReactNode;
  maxBytes: number;
  tooLarge: string;
  textarea: ComponentProps<'textarea'>;
  onFileText: (text: string) => void;
}) {
  const textId = useId();
  const [held, setHeld] = useState<{ chars: number; lines: number } | null>(null);
  const take = (text: string) => {
    const large = text.length > LARGE_TEXT;
    // A large text: the box goes first, so the form does not lay megabytes out in it on the way.
    if (large) flushSync(() => setHeld({ chars: text.length, lines: lineCount(text) }));
    onFileText(text);
    if (!large) setHeld(null);
  };
  const onPaste = (e: ClipboardEvent<HTMLTextAreaElement>) => {
    const text = e.clipboardData.getData('text/plain');
    if (text.length <= LARGE_TEXT) return;
    e.preventDefault();
    take(text);
  };
  return (
    <div className="space-y-3">
      <div>
        <label htmlFor={textId} className="block text-sm font-medium">
          CSV text
        </label>
        {held ? (
          <div
            role="status"
            className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 rounded-md border border-rule bg-paper px-3 py-2 text-sm"
          >
            <span>
              <span className="num">{held.lines.toLocaleString('en')}</span> lines (
              <span className="num">{(held.chars / 1e6).toFixed(1)}</span> million characters) in use, kept out of the box so the page stays
              quick.
            </span>
            <button type="button" className="text-teal-dark underline" onClick={() => setHeld(null)}>
              Show as text
            </button>
            <button type="button" className="text-teal-dark underline" onClick={() => take('')}>
              Clear
            </button>
          </div>
        ) : (
          <textarea
            id={textId}
            rows={rows}
            spellCheck={false}
            aria-describedby={`${textId}-hint`}
            placeholder={placeholder}
            className={`num mt-1 text-sm ${inputClass}`}
            onPaste={onPaste}
            {...textarea}
          />
        )}
        <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
          {hint}
        </p>
      </div>
      <CsvFileInput maxBytes={maxBytes} tooLarge={tooLarge} onText={take} />
    </div>
  );
}
