const segments = (path: string) => path.replace(/\/+$/, '').split('/').slice(1);

/**
 * Whether `path` fits an Express-style `pattern`: `:name` is one segment, a final `*` one or more.
 * Literal segments compare case-insensitively and a trailing slash is ignored, as Express routes do,
 * so a rule written here covers exactly the requests the route would answer.
 */
export function pathMatches(pattern: string, path: string): boolean {
  const want = segments(pattern);
  const got = segments(path);
  for (const [i, seg] of want.entries()) {
    if (seg === '*') return i === want.length - 1 && got.length > i && got.slice(i).every((s) => s !== '');
    const part = got[i];
    if (part === undefined || part === '') return false;
    if (!seg.startsWith(':') && seg.toLowerCase() !== part.toLowerCase()) return false;
  }
  return got.length === want.length;
}
