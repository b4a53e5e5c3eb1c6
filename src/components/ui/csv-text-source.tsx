import { useId, type ComponentProps, type ReactNode } from 'react';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';

/**
 * Paste CSV text, or load a file into the same box (read in the browser; nothing is uploaded). `textarea` wires the
 * box to its form (a react-hook-form `register`, or value and onChange); `onFileText` puts a loaded file's text there.
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
  return (
    <div className="space-y-3">
      <div>
        <label htmlFor={textId} className="block text-sm font-medium">
          CSV text
        </label>
        <textarea
          id={textId}
          rows={rows}
          spellCheck={false}
          aria-describedby={`${textId}-hint`}
          placeholder={placeholder}
          className={`num mt-1 text-sm ${inputClass}`}
          {...textarea}
        />
        <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
          {hint}
        </p>
      </div>
      <CsvFileInput maxBytes={maxBytes} tooLarge={tooLarge} onText={onFileText} />
    </div>
  );
}
