// Atom 1.0 feeds [S: RFC 4287, The Atom Syndication Format]: a feed needs id, title and updated (§4.1.1), each
// entry id, title and updated (§4.1.2), and an author on the feed or on every entry (§4.2.1). Ids are tag URIs
// [S: RFC 4151] built from the site's host and the thing's own id, so they stay the same for ever; dates are
// RFC 3339 (§3.3).
import { xmlText } from './xml-text.ts';

export interface AtomEntry {
  /** The thing's stable key, e.g. "build-12"; becomes tag:<host>,2026:<key>. */
  key: string;
  title: string;
  url: string;
  updated: Date;
  published?: Date;
  author: string;
  summary?: string;
  /** Plain text content (Markdown source is sent as text, not rendered). */
  content?: string;
}

export interface AtomFeed {
  key: string;
  title: string;
  subtitle?: string;
  /** Absolute URL of the feed itself, and of the page it follows. */
  selfUrl: string;
  pageUrl: string;
  /** When the feed has no entries: the date of the thing it follows. */
  since: Date;
  entries: AtomEntry[];
}

/** tag:host,2026:key — the year the site's tag authority was first used, fixed (RFC 4151 §2.1). */
export const tagUri = (origin: string, key: string) => `tag:${new URL(origin).hostname},2026:${key}`;

export function atomXml(feed: AtomFeed, origin: string): string {
  const updated = feed.entries.reduce((max, e) => (e.updated > max ? e.updated : max), feed.since);
  const el = (name: string, text: string, attrs = '') => `<${name}${attrs}>${xmlText(text)}</${name}>`;
  const entries = feed.entries.map((e) =>
    [
      '  <entry>',
      `    ${el('id', tagUri(origin, e.key))}`,
      `    ${el('title', e.title)}`,
      `    <link rel="alternate" type="text/html" href="${xmlText(e.url)}" />`,
      `    ${el('updated', e.updated.toISOString())}`,
      ...(e.published ? [`    ${el('published', e.published.toISOString())}`] : []),
      `    <author>${el('name', e.author)}</author>`,
      ...(e.summary ? [`    ${el('summary', e.summary)}`] : []),
      ...(e.content ? [`    ${el('content', e.content, ' type="text"')}`] : []),
      '  </entry>',
    ].join('\n'),
  );
  return [
    '<?xml version="1.0" encoding="utf-8"?>',
    '<feed xmlns="http://www.w3.org/2005/Atom">',
    `  ${el('id', tagUri(origin, feed.key))}`,
    `  ${el('title', feed.title)}`,
    ...(feed.subtitle ? [`  ${el('subtitle', feed.subtitle)}`] : []),
    `  <link rel="self" type="application/atom+xml" href="${xmlText(feed.selfUrl)}" />`,
    `  <link rel="alternate" type="text/html" href="${xmlText(feed.pageUrl)}" />`,
    `  ${el('updated', updated.toISOString())}`,
    '  <author><name>Scanwright makers</name></author>',
    `  ${el('generator', 'Scanwright')}`,
    ...entries,
    '</feed>',
    '',
  ].join('\n');
}
