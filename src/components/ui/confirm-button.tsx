import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button.tsx';

/** A destructive action behind a second, explicit click: the question and Yes/Keep appear in place. */
export function ConfirmButton({
  label,
  question,
  confirmLabel,
  onConfirm,
  disabled,
  ariaLabel,
}: {
  label: ReactNode;
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  disabled?: boolean;
  ariaLabel?: string;
}) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button variant="danger" onClick={() => setAsking(true)} disabled={disabled} aria-label={ariaLabel}>
        {label}
      </Button>
    );
  }
  return (
    <span role="group" aria-label={question} className="inline-flex flex-wrap items-center gap-2">
      <span className="text-sm font-medium">{question}</span>
      <Button
        variant="danger"
        autoFocus
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
        disabled={disabled}
      >
        {confirmLabel}
      </Button>
      <Button variant="ghost" onClick={() => setAsking(false)}>
        Keep it
      </Button>
    </span>
  );
}
