/** Scanwright's mark: a cantilever with its tip over a row of surface atoms. */
export function LogoMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 40 32" className={className} aria-hidden="true" focusable="false">
      <rect x="2" y="5" width="8" height="6" rx="1" fill="#2F6F73" />
      <path d="M10 7.5h19.5v2.5H10z" fill="#1D232B" />
      <path d="M25 10h5l-2.5 9z" fill="#B5532A" />
      <g fill="#2F6F73">
        <circle cx="9" cy="26" r="2.6" />
        <circle cx="16" cy="26" r="2.6" />
        <circle cx="23" cy="26" r="2.6" opacity="0.55" />
        <circle cx="30" cy="26" r="2.6" />
        <circle cx="37" cy="26" r="2.6" />
      </g>
    </svg>
  );
}
