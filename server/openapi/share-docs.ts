// Route table rows (route-docs.ts): pages with share cards, Atom feeds, the sitemap and robots.txt.
import { z } from 'zod';
import type { RouteDoc } from './route-doc.ts';

/** Pages and files for link previews, feed readers and crawlers (share.routes.ts): not JSON, but public routes. */
const feedId = (name: string) =>
  z.strictObject({
    [name]: z
      .string()
      .regex(/^[1-9]\d{0,9}\.atom$/)
      .describe('The id followed by .atom'),
  });
const pageWithCard = (path: string, what: string): RouteDoc => ({
  method: 'GET',
  path,
  summary: `The page of ${what}, with its share card`,
  description:
    'The client page with Open Graph and Twitter-card meta tags (title, summary, cover image) and its Atom feeds as ' +
    '`<link rel="alternate">`, so a pasted link previews. Visitors’ view only: anything a visitor cannot see answers the plain page with 404.',
  tag: 'Links and feeds',
  auth: 'visitor',
  response: { status: 200, description: 'HTML.', contentType: 'text/html' },
  errors: [404],
});
export const shareDocs: readonly RouteDoc[] = [
  pageWithCard('/builds/:id', 'a published build'),
  pageWithCard('/parts/:id', 'a registry part'),
  pageWithCard('/exchange/:id', 'an exchange listing'),
  pageWithCard('/builds', 'the builds index'),
  {
    method: 'GET',
    path: '/feeds/builds.atom',
    summary: 'Atom feed of newly published builds (RFC 4287)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'The newest 50 published builds.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/feeds/builds/:buildId',
    summary: 'Atom feed of a published build’s log entries',
    tag: 'Links and feeds',
    auth: 'visitor',
    params: feedId('buildId'),
    response: { status: 200, description: 'The build’s newest 50 log entries.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/feeds/parts/:partId',
    summary: 'Atom feed of a part’s newly accepted runs',
    tag: 'Links and feeds',
    auth: 'visitor',
    params: feedId('partId'),
    response: { status: 200, description: 'The part’s newest 50 accepted runs of published builds.', contentType: 'application/atom+xml' },
  },
  {
    method: 'GET',
    path: '/sitemap.xml',
    summary: 'Sitemap of every public page (sitemaps.org 0.9)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'Published builds, accepted parts, open listings.', contentType: 'application/xml' },
  },
  {
    method: 'GET',
    path: '/robots.txt',
    summary: 'What crawlers may read (RFC 9309)',
    tag: 'Links and feeds',
    auth: 'visitor',
    response: { status: 200, description: 'Plain text.', contentType: 'text/plain' },
  },
];
