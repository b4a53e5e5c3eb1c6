/** Initials in a teal disc: our own avatar, so no third-party images load. */
export function UserBadge({ login, name }: { login: string; name?: string | null }) {
  const source = (name || login).trim();
  const initials = source
    .split(/[\s-]+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w[0]!.toUpperCase())
    .join('');
  return (
    <span
      aria-hidden="true"
      className="inline-flex h-7 w-7 shrink-0 items-center justify-center rounded-full bg-teal text-xs font-semibold text-white"
    >
      {initials || '?'}
    </span>
  );
}
