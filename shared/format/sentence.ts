/** A calculation's refusal as a sentence people read: capital first letter, closing full stop (page and API alike). */
export function asSentence(text: string): string {
  const t = text.trim();
  return `${t.charAt(0).toUpperCase()}${t.slice(1)}${/[.!?]$/.test(t) ? '' : '.'}`;
}
