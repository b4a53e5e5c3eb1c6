import { describe, expect, test } from 'vitest';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { gfmTable } from 'micromark-extension-gfm-table';
import { gfmTableFromMarkdown } from 'mdast-util-gfm-table';
import { insertSnippet } from '../../shared/format/markdown-insert.ts';

// Each insertion is parsed back by the reference CommonMark parser the site's renderer builds on (mdast-util-from-markdown,
// with the GFM table extension) [S: CommonMark 0.31; GFM spec 0.29 §4.10], so the toolbar writes what renders.
const parse = (md: string) => fromMarkdown(md, { extensions: [gfmTable()], mdastExtensions: [gfmTableFromMarkdown()] });
const types = (md: string) => parse(md).children.map((n) => n.type);

describe('the write-up toolbar', () => {
  test('when lines are selected and made a heading or a list, then each gets its marker, and a second press takes it off', () => {
    const text = 'Intro\nclamp\nbar';
    const heading = insertSnippet(text, 6, 8, { kind: 'heading' });
    expect(heading.text).toBe('Intro\n## clamp\nbar');
    expect(types(heading.text)).toEqual(['paragraph', 'heading', 'paragraph']);
    const list = insertSnippet(text, 6, text.length, { kind: 'list' });
    expect(list.text).toBe('Intro\n- clamp\n- bar');
    expect(insertSnippet(list.text, list.selectionStart, list.selectionEnd, { kind: 'list' }).text).toBe(text);
  });

  test('when a table or a photo goes in mid-paragraph, then it stands as its own block with blank lines around it', () => {
    const table = insertSnippet('Before after', 6, 6, { kind: 'table' });
    expect(types(table.text)).toEqual(['paragraph', 'table', 'paragraph']);
    const image = insertSnippet('Text', 4, 4, { kind: 'image', url: '/uploads/a.webp', alt: 'The [left] clamp' });
    const para = parse(image.text).children[1] as { children: Array<{ type: string; alt?: string; url?: string }> };
    expect(para.children[0]).toMatchObject({ type: 'image', alt: 'The [left] clamp', url: '/uploads/a.webp' });
    expect(image.selectionStart).toBe(image.text.length);
  });
});
