// What a shared link and a feed reader see: the visitor's view only (every read goes through the same public
// services with no actor, so drafts, hidden listings and unaccepted parts stay out), as share cards, Atom
// feeds and the sitemap.
import { Op } from 'sequelize';
import { formatPlusMinus, formatShort } from '@shared/format/measured-number.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { Build } from '../models/build.model.ts';
import { Part } from '../models/part.model.ts';
import { Listing } from '../models/listing.model.ts';
import { NotFoundError } from '../errors.ts';
import type { ShareCard } from '../presenters/share-card.presenter.ts';
import type { AtomFeed } from '../presenters/atom.presenter.ts';
import { plainExcerpt } from '../presenters/xml-text.ts';
import { getBuild, listPublishedBuilds } from './build.service.ts';
import { loadBuildForView } from './build-access.ts';
import { summarizeBuilds } from './build-read.service.ts';
import { getPart } from './part.service.ts';
import { getListing } from './listing.service.ts';

/** How many entries a feed carries (the newest). */
const FEED_ENTRIES = 50;

const abs = (origin: string, path: string) => new URL(path, origin).toString();
const photoOf = (origin: string, p: { url: string; width: number; height: number; alt: string } | null | undefined) =>
  p ? { url: abs(origin, p.url), width: p.width, height: p.height, alt: p.alt } : undefined;

/** A published build's card, or null when a visitor cannot see it. */
export async function buildCard(buildId: number, origin: string): Promise<ShareCard | null> {
  // The card needs what a builds-index card shows (title, summary, cover, gains), not the whole build page.
  const row = await visible(() => loadBuildForView(null, buildId));
  const b = row ? (await summarizeBuilds(null, [row]))[0] : undefined;
  if (!b) return null;
  const gains = b.gains.length ? ` Measured: ${b.gains.map((g) => `${formatShort(g.gainNmPerV)} nm/V`).join(', ')}.` : '';
  return {
    title: b.title,
    description: plainExcerpt(`${b.summary}${gains}`, 240) + ` By ${b.owner.login}.`,
    url: abs(origin, `/builds/${b.id}`),
    type: 'article',
    image: photoOf(origin, b.cover),
    feeds: [
      { title: `${b.title}: log entries`, href: abs(origin, `/feeds/builds/${b.id}.atom`) },
      { title: 'Newly published builds', href: abs(origin, '/feeds/builds.atom') },
    ],
  };
}

/** An accepted part's card. */
export async function partCard(partId: number, origin: string): Promise<ShareCard | null> {
  const p = await visible(() => getPart(null, partId));
  if (!p) return null;
  const s = p.stats;
  const pooled =
    s.acceptedRunCount > 0 && s.gainMedianNmPerV !== null
      ? `median ${formatShort(s.gainMedianNmPerV)} nm/V from ${s.acceptedRunCount} accepted run${s.acceptedRunCount === 1 ? '' : 's'}`
      : 'no accepted runs yet';
  return {
    title: `${p.name} · parts registry`,
    description: `${partCategoryLabels[p.category]}: ${pooled}.${p.salvageSource ? ` Salvaged from ${plainExcerpt(p.salvageSource, 80)}.` : ''}`,
    url: abs(origin, `/parts/${p.id}`),
    type: 'website',
    image: photoOf(origin, p.photos[0]),
    feeds: [{ title: `${p.name}: newly accepted runs`, href: abs(origin, `/feeds/parts/${p.id}.atom`) }],
  };
}

/** An open (not hidden) listing's card. */
export async function listingCard(listingId: number, origin: string): Promise<ShareCard | null> {
  const l = await visible(() => getListing(null, listingId));
  if (!l || l.hidden) return null;
  const verb = l.kind === 'offering' ? 'Offered' : 'Sought';
  return {
    title: `${verb}: ${l.part.name}${l.quantity > 1 ? ` × ${l.quantity}` : ''}`,
    description: `${verb} on the Scanwright exchange by ${l.owner.login} · ${l.priceLabel} · ${l.region}${l.status === 'open' ? '' : ` · ${l.status}`}.`,
    url: abs(origin, `/exchange/${l.id}`),
    type: 'website',
    image: photoOf(origin, l.photos[0]),
  };
}

/** The newest published builds. */
export async function buildsFeed(origin: string): Promise<AtomFeed> {
  const list = await listPublishedBuilds({ page: 1, pageSize: FEED_ENTRIES });
  return {
    key: 'builds',
    title: 'Scanwright: newly published builds',
    selfUrl: abs(origin, '/feeds/builds.atom'),
    pageUrl: abs(origin, '/builds'),
    since: new Date(Date.UTC(2026, 0, 1)),
    entries: list.items.map((b) => ({
      key: `build-${b.id}`,
      title: b.title,
      url: abs(origin, `/builds/${b.id}`),
      updated: new Date(b.publishedAt ?? b.updatedAt),
      published: new Date(b.publishedAt ?? b.createdAt),
      author: b.owner.login,
      summary: plainExcerpt(b.summary, 400),
    })),
  };
}

/** A part's newly accepted runs (of published builds, as its page lists them). */
export async function partFeed(partId: number, origin: string): Promise<AtomFeed> {
  const p = await getPart(null, partId);
  const runs = [...p.runs].sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id - a.id).slice(0, FEED_ENTRIES);
  return {
    key: `part-${p.id}-runs`,
    title: `Scanwright: accepted runs of ${p.name}`,
    selfUrl: abs(origin, `/feeds/parts/${p.id}.atom`),
    pageUrl: abs(origin, `/parts/${p.id}`),
    since: new Date(p.createdAt),
    entries: runs.map((r) => {
      const pm =
        r.gainStdUncertaintyNmPerV !== null
          ? formatPlusMinus(r.gainNmPerV, r.gainStdUncertaintyNmPerV, 'std')
          : r.gainCi95NmPerV[0] !== null && r.gainCi95NmPerV[1] !== null
            ? formatPlusMinus(r.gainNmPerV, (r.gainCi95NmPerV[1] - r.gainCi95NmPerV[0]) / 2, 'ci95')
            : `${formatShort(r.gainNmPerV)} nm/V`;
      return {
        key: `run-${r.id}`,
        title: `${pm} · ${r.buildTitle}`,
        url: abs(origin, `/builds/${r.buildId}#run-${r.id}`),
        updated: new Date(r.createdAt),
        author: r.maker,
        summary: `An accepted ${r.kind} run of ${p.name} (${r.method}) in “${r.buildTitle}” by ${r.maker}: ${pm}.`,
      };
    }),
  };
}

/** A published build's log entries, newest first. */
export async function buildFeed(buildId: number, origin: string): Promise<AtomFeed> {
  const b = await getBuild(null, buildId);
  const entries = [...b.entries].sort((x, y) => y.entryDate.localeCompare(x.entryDate) || y.id - x.id).slice(0, FEED_ENTRIES);
  return {
    key: `build-${b.id}-log`,
    title: `Scanwright: ${b.title} (log entries)`,
    selfUrl: abs(origin, `/feeds/builds/${b.id}.atom`),
    pageUrl: abs(origin, `/builds/${b.id}`),
    since: new Date(b.publishedAt ?? b.updatedAt),
    entries: entries.map((e) => ({
      key: `entry-${e.id}`,
      title: e.title,
      url: abs(origin, `/builds/${b.id}#entry-${e.id}`),
      updated: new Date(`${e.entryDate}T00:00:00Z`),
      author: b.owner.login,
      summary: plainExcerpt(e.body, 300),
      content: e.body,
    })),
  };
}

/** Every public page's path and last change, for sitemap.xml [S: sitemaps.org protocol 0.9]. */
export async function sitemapPaths(): Promise<{ path: string; updated: Date | null }[]> {
  const [builds, parts, listings] = await Promise.all([
    Build.findAll({ where: { status: 'published' }, attributes: ['id', 'updatedAt'], order: [['id', 'ASC']], raw: true }),
    Part.findAll({ where: { status: 'accepted', mergedIntoId: null }, attributes: ['id', 'updatedAt'], order: [['id', 'ASC']], raw: true }),
    Listing.findAll({
      where: { status: { [Op.ne]: 'closed' }, hiddenAt: null },
      attributes: ['id', 'updatedAt'],
      order: [['id', 'ASC']],
      raw: true,
    }),
  ]);
  return [
    { path: '/', updated: null },
    { path: '/builds', updated: null },
    { path: '/parts', updated: null },
    { path: '/exchange', updated: null },
    { path: '/workbench', updated: null },
    ...builds.map((b) => ({ path: `/builds/${b.id}`, updated: b.updatedAt })),
    ...parts.map((p) => ({ path: `/parts/${p.id}`, updated: p.updatedAt })),
    ...listings.map((l) => ({ path: `/exchange/${l.id}`, updated: l.updatedAt })),
  ];
}

/** The read, or null when it is not there for a visitor (404 from the service). */
async function visible<T>(read: () => Promise<T>): Promise<T | null> {
  try {
    return await read();
  } catch (err) {
    if (err instanceof NotFoundError) return null;
    throw err;
  }
}
