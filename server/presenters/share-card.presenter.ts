// The head tags that make a shared link preview: Open Graph [S: The Open Graph protocol, ogp.me] and Twitter
// card [S: developer.x.com, "Cards markup"] meta tags, a canonical link, and the page's Atom feeds as
// <link rel="alternate"> [S: RFC 4287 and the HTML Living Standard, "link type alternate"]. Every value is
// escaped (xml-text.ts).
import { xmlText } from './xml-text.ts';

export interface ShareCard {
  title: string;
  description: string;
  /** Absolute URL of the page. */
  url: string;
  type: 'article' | 'website';
  image?: { url: string; width: number; height: number; alt: string };
  feeds?: { title: string; href: string }[];
}

const SITE = 'Scanwright';

export function shareHeadTags(card: ShareCard): string {
  const meta = (attr: 'property' | 'name', key: string, value: string | number) =>
    `<meta ${attr}="${key}" content="${xmlText(String(value))}" />`;
  const tags = [
    `<link rel="canonical" href="${xmlText(card.url)}" />`,
    meta('name', 'description', card.description),
    meta('property', 'og:site_name', SITE),
    meta('property', 'og:type', card.type),
    meta('property', 'og:title', card.title),
    meta('property', 'og:description', card.description),
    meta('property', 'og:url', card.url),
    meta('name', 'twitter:card', card.image ? 'summary_large_image' : 'summary'),
    meta('name', 'twitter:title', card.title),
    meta('name', 'twitter:description', card.description),
  ];
  if (card.image)
    tags.push(
      meta('property', 'og:image', card.image.url),
      meta('property', 'og:image:width', card.image.width),
      meta('property', 'og:image:height', card.image.height),
      meta('property', 'og:image:alt', card.image.alt),
      meta('name', 'twitter:image', card.image.url),
      meta('name', 'twitter:image:alt', card.image.alt),
    );
  for (const f of card.feeds ?? [])
    tags.push(`<link rel="alternate" type="application/atom+xml" title="${xmlText(f.title)}" href="${xmlText(f.href)}" />`);
  return tags.join('\n    ');
}

/**
 * The client's index.html with the card's title and tags: the generic description goes, the page's own
 * comes in before </head>.
 */
export function withShareCard(indexHtml: string, card: ShareCard): string {
  return indexHtml
    .replace(/<title>[^<]*<\/title>/, `<title>${xmlText(`${card.title} · ${SITE}`)}</title>`)
    .replace(/<meta\s+name="description"[^>]*>/, '')
    .replace('</head>', `  ${shareHeadTags(card)}\n  </head>`);
}
