// Text made safe for XML and HTML attribute values and element content: the five predefined entities
// [S: W3C XML 1.0 (5th ed.) §2.4 and §4.6], and characters XML 1.0 does not allow (C0 controls but tab, CR and LF;
// lone surrogates; U+FFFE/U+FFFF) dropped [S: XML 1.0 §2.2 "Char"].
const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

export function xmlText(s: string): string {
  return s
    .replace(
      // eslint-disable-next-line no-control-regex -- these are the characters XML 1.0 forbids
      /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g,
      '',
    )
    .replace(/[&<>"']/g, (c) => ENTITIES[c]!);
}

/** A short plain-text excerpt of Markdown: links and images to their text, marks removed, whitespace folded. */
export function plainExcerpt(markdown: string, max = 200): string {
  const text = markdown
    .replace(/```[\s\S]*?```/g, ' ')
    .replace(/!\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/^\s{0,3}(#{1,6}|>|[-*+]|\d+\.)\s+/gm, '')
    .replace(/[*_`~|]/g, '')
    .replace(/\s+/g, ' ')
    .trim();
  return text.length <= max ? text : `${text.slice(0, max - 1).replace(/\s+\S*$/, '')}…`;
}
