// What the write-up toolbar puts into Markdown text: an edit of the text and where the selection goes after it.
// The syntax is CommonMark 0.31 (ATX headings §4.2, bullet lists §5.2, images §6.4) and the GFM tables extension
// (GitHub Flavored Markdown spec 0.29, §4.10), which the site's renderer (react-markdown + remark-gfm) reads.

export interface TextEdit {
  text: string;
  selectionStart: number;
  selectionEnd: number;
}

export type Snippet = { kind: 'heading' } | { kind: 'list' } | { kind: 'table' } | { kind: 'image'; url: string; alt: string };

/** The start of the line that holds `at`, and the end of the line that holds `end`. */
function lineSpan(text: string, at: number, end: number): [number, number] {
  const start = text.lastIndexOf('\n', Math.max(0, at - 1)) + (at === 0 ? 0 : 1);
  const nl = text.indexOf('\n', end);
  return [at === 0 ? 0 : start, nl === -1 ? text.length : nl];
}

/** A block on lines of its own: blank lines around it unless the text already has them. */
function asBlock(text: string, at: number, block: string): TextEdit {
  const before = text.slice(0, at);
  const after = text.slice(at);
  const lead = before === '' || before.endsWith('\n\n') ? '' : before.endsWith('\n') ? '\n' : '\n\n';
  const trail = after === '' || after.startsWith('\n\n') ? '' : after.startsWith('\n') ? '\n' : '\n\n';
  const inserted = lead + block + trail;
  const caret = before.length + lead.length + block.length;
  return { text: before + inserted + after, selectionStart: caret, selectionEnd: caret };
}

/** Apply a toolbar snippet to the selection [start, end) of `text`. */
export function insertSnippet(text: string, start: number, end: number, snippet: Snippet): TextEdit {
  switch (snippet.kind) {
    case 'heading':
    case 'list': {
      const [from, to] = lineSpan(text, start, end);
      const marker = snippet.kind === 'heading' ? '## ' : '- ';
      const lines = text.slice(from, to).split('\n');
      const done = lines.every((l) => l.startsWith(marker));
      const changed = lines.map((l) => (done ? l.slice(marker.length) : l.startsWith(marker) ? l : marker + l)).join('\n');
      return { text: text.slice(0, from) + changed + text.slice(to), selectionStart: from, selectionEnd: from + changed.length };
    }
    case 'table':
      return asBlock(text, end, '| Quantity | Value | Unit |\n| --- | ---: | --- |\n| Gain |  | nm/V |');
    case 'image': {
      // Brackets in the alt text would end the link text early (CommonMark §6.4): escape them.
      const alt = snippet.alt.replace(/[[\]\\]/g, (c) => `\\${c}`);
      return asBlock(text, end, `![${alt}](${snippet.url})`);
    }
  }
}
