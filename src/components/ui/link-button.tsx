import type { ComponentProps } from 'react';
import { Link } from 'react-router-dom';

type Variant = 'primary' | 'secondary' | 'ghost';

const styles: Record<Variant, string> = {
  primary: 'bg-copper text-white hover:bg-copper-dark border-copper',
  secondary: 'bg-white text-teal-dark border-teal hover:bg-teal/10',
  ghost: 'bg-transparent text-ink border-transparent hover:bg-paper-deep',
};

const base = 'inline-flex items-center justify-center gap-2 rounded-md border px-3 py-1.5 text-sm font-medium transition-colors';

/** A router link that looks like our Button, for actions that are really navigation. */
export function LinkButton({ variant = 'primary', className = '', ...props }: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link {...props} className={`${base} ${styles[variant]} ${className}`} />;
}

/** The same look for a plain anchor (server routes such as sign-in, which leave the client app). */
export function AnchorButton({ variant = 'primary', className = '', ...props }: ComponentProps<'a'> & { variant?: Variant }) {
  return <a {...props} className={`${base} ${styles[variant]} ${className}`} />;
}
