import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

const styles: Record<Variant, string> = {
  primary: 'bg-copper text-white hover:bg-copper-dark border-copper',
  secondary: 'bg-white text-teal-dark border-teal hover:bg-teal/10',
  ghost: 'bg-transparent text-ink border-transparent hover:bg-paper-deep',
  danger: 'bg-white text-danger border-danger hover:bg-danger/10',
};

/** The app's button; `variant` picks copper (main action), teal outline, plain or danger. */
export function Button({ variant = 'primary', className = '', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      type="button"
      {...props}
      className={
        `inline-flex items-center justify-center gap-2 rounded-md border px-3 py-1.5 text-sm font-medium ` +
        `transition-colors disabled:cursor-not-allowed disabled:opacity-50 ${styles[variant]} ${className}`
      }
    />
  );
}
