// Links that travel: share cards (Open Graph, Twitter card) in the HTML of build, part and listing pages, the
// Atom feeds (RFC 4287) and the sitemap. The HTML is parsed with htmlparser2 and the feeds and sitemap with
// fast-xml-parser (validator and parser), both independent of the code under test.
import { mkdtempSync, writeFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { parseDocument, DomUtils } from 'htmlparser2';
import xmlParser from 'fast-xml-parser';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { createBuildRow, createListingRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { Build } from '../../server/models/build.model.ts';
import { LogEntry } from '../../server/models/log-entry.model.ts';

let t: TestApp;
let dist: string;
beforeAll(async () => {
  // A stand-in for the built client: the page the server decorates.
  dist = mkdtempSync(join(tmpdir(), 'scanwright-dist-'));
  writeFileSync(
    join(dist, 'index.html'),
    '<!doctype html><html lang="en"><head><meta charset="UTF-8" /><meta name="description" content="generic" /><title>Scanwright</title></head><body><div id="root"></div></body></html>',
  );
  t = await startTestApp({ clientDist: dist, publicUrl: 'https://scanwright.example' });
});
afterAll(async () => {
  await t.close();
  rmSync(dist, { recursive: true, force: true });
});

/** The meta tags of a page, by property or name. */
async function metaOf(path: string) {
  const res = await request(t.app).get(path);
  const doc = parseDocument(res.text);
  const meta: Record<string, string> = {};
  for (const el of DomUtils.getElementsByTagName('meta', doc)) {
    const key = el.attribs.property ?? el.attribs.name;
    if (key) meta[key] = el.attribs.content ?? '';
  }
  const alternates = DomUtils.getElementsByTagName('link', doc)
    .filter((l) => l.attribs.rel === 'alternate')
    .map((l) => ({ type: l.attribs.type, href: l.attribs.href }));
  const title = DomUtils.textContent(DomUtils.getElementsByTagName('title', doc)[0]!);
  return { res, meta, alternates, title };
}

interface XmlEntry {
  id: string;
  title: string;
  updated: string;
  author: { name: string };
  link: { '@href': string };
}
interface XmlDoc {
  feed: { '@xmlns': string; id: string; title: string; updated: string; entry?: XmlEntry | XmlEntry[] };
  urlset: { url: { loc: string } | { loc: string }[] };
}

/** A feed's entries as a list (the parser gives one entry as an object). */
const entriesOf = (feed: XmlDoc['feed']): XmlEntry[] => (feed.entry === undefined ? [] : [feed.entry].flat());

const validXml = (xml: string): XmlDoc => {
  expect(xmlParser.validate(xml)).toBe(true);
  // fast-xml-parser 3 leaves entities as written; the five predefined ones decoded here [S: XML 1.0 §4.6].
  const decode = (v: string) =>
    v.replace(/&(lt|gt|quot|apos|amp);/g, (_m, e: string) => ({ lt: '<', gt: '>', quot: '"', apos: "'", amp: '&' })[e]!);
  return xmlParser.parse(xml, {
    ignoreAttributes: false,
    attributeNamePrefix: '@',
    tagValueProcessor: decode,
    attrValueProcessor: decode,
  }) as XmlDoc;
};

describe('share cards', () => {
  test('when a published build is fetched, then its title, summary and cover are in Open Graph and Twitter tags, escaped', async () => {
    const owner = await createUser({ login: 'card-maker' });
    const build = await createBuildRow(owner.id, { status: 'published', title: 'A <b>bold</b> "STM" & more' });
    await build.update({ summary: 'Bimorph bar scanner; gains <script>alert(1)</script> measured.', publishedAt: new Date() });
    const { res, meta, alternates, title } = await metaOf(`/builds/${build.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    // The parser gives back the exact text: escaping held, nothing broke out of the attribute [S: HTML parsing].
    expect(meta['og:title']).toBe('A <b>bold</b> "STM" & more');
    expect(meta['twitter:title']).toBe('A <b>bold</b> "STM" & more');
    expect(meta['og:description']).toContain('<script>alert(1)</script>');
    expect(res.text).not.toContain('<script>alert(1)</script>');
    expect(meta['og:url']).toBe(`https://scanwright.example/builds/${build.id}`);
    expect(meta['og:type']).toBe('article');
    expect(meta.description).not.toBe('generic');
    expect(title).toBe('A <b>bold</b> "STM" & more · Scanwright');
    expect(alternates).toContainEqual({ type: 'application/atom+xml', href: `https://scanwright.example/feeds/builds/${build.id}.atom` });
  });

  test('when a draft, a submitted build, an unknown id or a hidden listing is fetched, then the plain page with 404 and no card', async () => {
    const owner = await createUser();
    for (const status of ['draft', 'submitted', 'returned', 'declined']) {
      const b = await createBuildRow(owner.id, { status, title: `Secret ${status} build` });
      const { res, meta } = await metaOf(`/builds/${b.id}`);
      expect(res.status).toBe(404);
      expect(meta['og:title']).toBeUndefined();
      expect(res.text).not.toContain('Secret');
    }
    expect((await metaOf('/builds/999999')).res.status).toBe(404);
    const part = await createPart();
    void part;
    const hidden = await createListingRow(owner.id, { hiddenAt: new Date() });
    expect((await metaOf(`/exchange/${hidden.id}`)).meta['og:title']).toBeUndefined();
  });

  test('when /builds/new or /parts/propose is fetched, then the client page as before (not a card, not an error)', async () => {
    for (const path of ['/builds/new', '/parts/propose', '/exchange/new']) {
      const res = await request(t.app).get(path);
      expect(res.status, path).toBe(200);
      expect(res.text).toContain('content="generic"');
    }
  });

  test('when a part and an open listing are fetched, then each has its own card', async () => {
    const part = await createPart({ name: 'Disc & bar' });
    const p = await metaOf(`/parts/${part.id}`);
    expect(p.res.status).toBe(200);
    expect(p.meta['og:title']).toBe('Disc & bar · parts registry');
    expect(p.alternates).toContainEqual({ type: 'application/atom+xml', href: `https://scanwright.example/feeds/parts/${part.id}.atom` });
    const owner = await createUser({ login: 'card-seller' });
    const listing = await createListingRow(owner.id);
    const l = await metaOf(`/exchange/${listing.id}`);
    expect(l.res.status).toBe(200);
    expect(l.meta['og:title']).toMatch(/^Offered: /);
    expect(l.meta['og:description']).toContain('card-seller');
  });
});

describe('Atom feeds', () => {
  test('when /feeds/builds.atom is read, then it is valid Atom with stable tag ids, and drafts are not in it', async () => {
    const owner = await createUser({ login: 'feed-maker' });
    const pub = await createBuildRow(owner.id, { status: 'published', title: 'Feed & friends' });
    await pub.update({ publishedAt: new Date() });
    const draft = await createBuildRow(owner.id, { status: 'draft', title: 'Not yet shown' });
    const res = await request(t.app).get('/feeds/builds.atom');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/atom\+xml/);
    const feed = validXml(res.text).feed;
    expect(feed['@xmlns']).toBe('http://www.w3.org/2005/Atom');
    // RFC 4287 §4.1.1: id, title and updated on the feed; §4.1.2 on every entry.
    expect(feed.id).toBe('tag:scanwright.example,2026:builds');
    expect(typeof feed.title).toBe('string');
    expect(Date.parse(feed.updated)).not.toBeNaN();
    const entries = entriesOf(feed);
    const mine = entries.find((e) => e.id === `tag:scanwright.example,2026:build-${pub.id}`)!;
    expect(mine).toBeTruthy();
    expect(mine.title).toBe('Feed & friends');
    expect(mine.author.name).toBe('feed-maker');
    expect(mine.link['@href']).toBe(`https://scanwright.example/builds/${pub.id}`);
    expect(entries.some((e: XmlEntry) => e.id.endsWith(`build-${draft.id}`))).toBe(false);
    // Stable: the same id on a second read.
    const again = validXml((await request(t.app).get('/feeds/builds.atom')).text).feed;
    expect(entriesOf(again).map((e: XmlEntry) => e.id)).toContain(mine.id);
  });

  test('when a build’s feed is read, then its log entries; a draft’s feed is 404', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'published' });
    await LogEntry.create({ buildId: b.id, entryDate: '2026-11-20', title: 'Wired the <bar>', body: 'Soldered **both** halves.' });
    const feed = validXml((await request(t.app).get(`/feeds/builds/${b.id}.atom`)).text).feed;
    const entry = entriesOf(feed)[0]!;
    expect(entry.title).toBe('Wired the <bar>');
    expect(entry.updated).toBe('2026-11-20T00:00:00.000Z');
    const draft = await createBuildRow(owner.id, { status: 'draft' });
    expect((await request(t.app).get(`/feeds/builds/${draft.id}.atom`)).status).toBe(404);
    expect((await request(t.app).get('/feeds/builds/abc.atom')).status).toBe(400);
  });

  test('when a part’s feed is read, then its accepted runs of published builds, newest first, and none of a draft', async () => {
    const owner = await createUser({ login: 'run-feeder' });
    const part = await createPart();
    const pub = await createBuildRow(owner.id, { status: 'published', title: 'Published rig' });
    const draft = await createBuildRow(owner.id, { status: 'draft', title: 'Draft rig' });
    for (const b of [pub, draft])
      await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 42, status: 'accepted' });
    await Build.update({ publishedAt: new Date() }, { where: { id: pub.id } });
    const feed = validXml((await request(t.app).get(`/feeds/parts/${part.id}.atom`)).text).feed;
    const entries = entriesOf(feed);
    expect(entries.map((e: XmlEntry) => e.title)).toEqual([expect.stringContaining('Published rig')]);
    expect(entries[0]!.title).toMatch(/nm\/V/);
  });
});

describe('sitemap.xml and robots.txt', () => {
  test('when the sitemap is read, then it is valid and lists published builds and not drafts', async () => {
    const owner = await createUser();
    const pub = await createBuildRow(owner.id, { status: 'published' });
    const draft = await createBuildRow(owner.id, { status: 'draft' });
    const res = await request(t.app).get('/sitemap.xml');
    expect(res.status).toBe(200);
    const locs = [validXml(res.text).urlset.url].flat().map((u: { loc: string }) => u.loc);
    expect(locs).toContain(`https://scanwright.example/builds/${pub.id}`);
    expect(locs).not.toContain(`https://scanwright.example/builds/${draft.id}`);
  });

  test('when robots.txt is read, then it keeps crawlers off the API and names the sitemap', async () => {
    const res = await request(t.app).get('/robots.txt');
    expect(res.status).toBe(200);
    expect(res.text).toContain('Disallow: /api/');
    expect(res.text).toContain('Sitemap: https://scanwright.example/sitemap.xml');
  });
});
