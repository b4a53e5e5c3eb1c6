import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { FormError, inputClass } from '@/components/ui/form-bits.tsx';

/**
 * A labelled Markdown text box with its send button, for anything people post (comments, review-thread posts):
 * empty text is not sent, and the box clears once the post is stored.
 */
export function MarkdownPostForm({
  id,
  label,
  maxLength,
  rows = 3,
  placeholder,
  pending,
  error,
  submitLabel,
  pendingLabel,
  variant = 'primary',
  className = 'space-y-2',
  onPost,
}: {
  id: string;
  label: string;
  maxLength: number;
  rows?: number;
  placeholder?: string;
  pending: boolean;
  error?: string;
  submitLabel: string;
  pendingLabel: string;
  variant?: 'primary' | 'secondary';
  className?: string;
  /** Send the text; call `stored` once it is stored, to clear the box. */
  onPost: (body: string, stored: () => void) => void;
}) {
  const [body, setBody] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (body.trim()) onPost(body, () => setBody(''));
  };
  return (
    <form onSubmit={submit} noValidate className={className}>
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <textarea
        id={id}
        rows={rows}
        maxLength={maxLength}
        className={inputClass}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        placeholder={placeholder}
      />
      <FormError message={error} />
      <Button type="submit" variant={variant} disabled={!body.trim() || pending}>
        {pending ? pendingLabel : submitLabel}
      </Button>
    </form>
  );
}
