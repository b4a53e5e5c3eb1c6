import { readFile, stat } from 'node:fs/promises';
import { Router, type NextFunction, type RequestHandler, type Response } from 'express';
import { z } from 'zod';
import { withShareCard, type ShareCard } from '../presenters/share-card.presenter.ts';
import { atomXml } from '../presenters/atom.presenter.ts';
import { xmlText } from '../presenters/xml-text.ts';
import { buildCard, buildFeed, buildsFeed, listingCard, partCard, partFeed, sitemapPaths } from '../services/share.service.ts';
import { route } from './route.ts';

/** `/feeds/parts/12.atom`: the id with its extension. */
const atomId = (name: string) =>
  z.strictObject({
    [name]: z
      .string()
      .regex(/^[1-9]\d{0,9}\.atom$/)
      .transform((s) => Number(s.slice(0, -5))),
  });

/**
 * Pages with a share card (Open Graph and Twitter meta tags in the client's index.html, for link previews),
 * Atom feeds, sitemap.xml and robots.txt. Cards are the visitor's view only; anything a visitor cannot see
 * gets the plain page (the client shows its own not-found) with status 404.
 */
export function shareRoutes(options: { indexHtml: string; origin: string }): Router {
  const r = Router();
  const { origin } = options;
  let cached: { mtimeMs: number; html: string } | null = null;
  const indexHtml = async (): Promise<string | null> => {
    const s = await stat(options.indexHtml).catch(() => null);
    if (!s) return null;
    if (!cached || cached.mtimeMs !== s.mtimeMs) cached = { mtimeMs: s.mtimeMs, html: await readFile(options.indexHtml, 'utf8') };
    return cached.html;
  };
  const page = async (res: Response, next: NextFunction, card: ShareCard | null): Promise<void> => {
    const html = await indexHtml();
    if (html === null) return next();
    res
      .status(card ? 200 : 404)
      .set('Cache-Control', 'no-cache')
      .type('html')
      .send(card ? withShareCard(html, card) : html);
  };
  const atom = (res: Response, xml: string): void => {
    res.set('Cache-Control', 'public, max-age=300').type('application/atom+xml; charset=utf-8').send(xml);
  };
  /** A page whose last segment is a numeric id; other paths there (/builds/new, /parts/propose) are the client's. */
  const withCard =
    (card: (id: number, origin: string) => Promise<ShareCard | null>): RequestHandler =>
    async (req, res, next) => {
      const raw = String(req.params.id);
      if (!/^[1-9]\d{0,9}$/.test(raw)) return next();
      await page(res, next, await card(Number(raw), origin));
    };

  r.get('/builds/:id', withCard(buildCard));
  r.get('/parts/:id', withCard(partCard));
  r.get('/exchange/:id', withCard(listingCard));
  r.get('/builds', async (_req, res, next) =>
    page(res, next, {
      title: 'Builds',
      description: 'Build logs of home-made scanning probe instruments, with measured actuator gains checked by moderators.',
      url: `${origin}/builds`,
      type: 'website',
      feeds: [{ title: 'Newly published builds', href: `${origin}/feeds/builds.atom` }],
    }),
  );

  r.get(
    '/feeds/builds.atom',
    route({}, async ({ res }) => atom(res, atomXml(await buildsFeed(origin), origin))),
  );
  r.get(
    '/feeds/builds/:buildId',
    route({ params: atomId('buildId') }, async ({ params, res }) =>
      atom(res, atomXml(await buildFeed(params.buildId as number, origin), origin)),
    ),
  );
  r.get(
    '/feeds/parts/:partId',
    route({ params: atomId('partId') }, async ({ params, res }) =>
      atom(res, atomXml(await partFeed(params.partId as number, origin), origin)),
    ),
  );

  r.get(
    '/sitemap.xml',
    route({}, async ({ res }) => {
      const urls = (await sitemapPaths()).map(
        (u) =>
          `  <url><loc>${xmlText(origin + u.path)}</loc>${u.updated ? `<lastmod>${new Date(u.updated).toISOString()}</lastmod>` : ''}</url>`,
      );
      res
        .set('Cache-Control', 'public, max-age=3600')
        .type('application/xml; charset=utf-8')
        .send(
          `<?xml version="1.0" encoding="utf-8"?>\n<urlset xmlns="http://www.sitemaps.org/schemas/sitemap/0.9">\n${urls.join('\n')}\n</urlset>\n`,
        );
    }),
  );
  r.get('/robots.txt', (_req, res) => {
    // [S: RFC 9309, Robots Exclusion Protocol] — the API, sign-in and per-person pages are not for crawlers.
    res
      .set('Cache-Control', 'public, max-age=3600')
      .type('text/plain; charset=utf-8')
      .send(
        [
          'User-agent: *',
          'Disallow: /api/',
          'Disallow: /auth/',
          'Disallow: /inbox',
          'Disallow: /account',
          'Disallow: /review',
          'Disallow: /admin',
          '',
          `Sitemap: ${origin}/sitemap.xml`,
          '',
        ].join('\n'),
      );
  });
  return r;
}
