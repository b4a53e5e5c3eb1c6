import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { standInEmail } from '../../server/dev/demo-accounts.ts';
import { Message, MessageThread } from '../../server/models/message.model.ts';
import { Listing } from '../../server/models/listing.model.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const send = (a: Agent, method: 'post' | 'patch', path: string, body: object) => a[method](path).set('X-CSRF-Token', a.csrf).send(body);

async function ownerWithListing(over: object = {}) {
  const owner = await createUser();
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await send(a, 'post', '/api/listings', {
    partId: part.id,
    kind: 'offering',
    quantity: 3,
    condition: 'salvaged-tested',
    priceKind: 'price',
    priceAmount: 4.5,
    currency: 'EUR',
    region: 'Lower Saxony',
    shipsTo: 'EU',
    notes: 'Three bars.',
    ...over,
  });
  expect(res.status).toBe(201);
  return { owner, part, a, listing: res.body };
}

describe('listings', () => {
  test('when a maker posts a listing, then 201 open with its price label, and it appears in the exchange with filters', async () => {
    const { listing, part, owner } = await ownerWithListing();
    expect(listing).toMatchObject({
      status: 'open',
      kind: 'offering',
      priceLabel: '4.50 EUR',
      owner: { login: owner.login },
      part: { id: part.id },
      abilities: { edit: true, message: false },
    });
    expect(JSON.stringify(listing)).not.toContain('@');
    const found = await request(t.app).get(`/api/listings?partId=${part.id}`);
    expect(found.body.items.map((l: { id: number }) => l.id)).toEqual([listing.id]);
    expect((await request(t.app).get(`/api/listings?partId=${part.id}&kind=seeking`)).body.total).toBe(0);
    expect((await request(t.app).get(`/api/listings?partId=${part.id}&freeOnly=true`)).body.total).toBe(0);
    expect((await request(t.app).get(`/api/listings?partId=${part.id}&condition=salvaged-tested&region=saxony`)).body.total).toBe(1);
    expect(
      (await request(t.app).get(`/api/listings?q=${encodeURIComponent(part.name)}`)).body.items.map((l: { id: number }) => l.id),
    ).toContain(listing.id);
  });

  test.each<[object, string, string]>([
    [{ priceKind: 'price', priceAmount: null }, 'a price without amount', 'priceAmount'],
    [{ currency: 'euro' }, 'a bad currency', 'currency'],
    [{ quantity: 0 }, 'zero quantity', 'quantity'],
    [{ kind: 'lending' }, 'an unknown kind', 'kind'],
    [{ partId: 999999999 }, 'an unknown part', 'partId'],
  ])('when the listing has %o (%s), then 400 on %s', async (over, _what, field) => {
    const owner = await createUser();
    const part = await createPart();
    const a = await signIn(t, owner.login);
    const res = await send(a, 'post', '/api/listings', {
      partId: part.id,
      kind: 'offering',
      quantity: 1,
      condition: 'new',
      priceKind: 'price',
      priceAmount: 1,
      currency: 'EUR',
      region: 'Here',
      ...over,
    });
    expectError(res, 400, 'validation_failed', field);
  });

  test('when the owner moves open → reserved → closed, then it leaves the exchange and cannot reopen; others get 403', async () => {
    const { a, listing, part } = await ownerWithListing({ priceKind: 'free', priceAmount: undefined, currency: undefined });
    const other = await signIn(t, (await createUser()).login);
    expectError(await send(other, 'patch', `/api/listings/${listing.id}`, { status: 'closed' }), 403, 'forbidden');
    expect((await send(a, 'patch', `/api/listings/${listing.id}`, { status: 'reserved' })).body.status).toBe('reserved');
    expect((await request(t.app).get(`/api/listings?partId=${part.id}`)).body.total).toBe(1);
    expect((await send(a, 'patch', `/api/listings/${listing.id}`, { status: 'closed' })).body.status).toBe('closed');
    expect((await request(t.app).get(`/api/listings?partId=${part.id}`)).body.total).toBe(0);
    expectError(await send(a, 'patch', `/api/listings/${listing.id}`, { status: 'open' }), 400, 'validation_failed', 'status');
    expect((await a.get('/api/listings/mine')).body.items.map((l: { id: number }) => l.id)).toContain(listing.id);
  });

  test('when a moderator hides a listing with a note, then visitors get 404, the owner sees the note, and the trail records it', async () => {
    const { a, listing } = await ownerWithListing();
    const mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
    expectError(await send(mod, 'post', `/api/listings/${listing.id}/visibility`, { hidden: true }), 400, 'validation_failed', 'note');
    const res = await send(mod, 'post', `/api/listings/${listing.id}/visibility`, {
      hidden: true,
      note: 'Selling mains-powered gear without cautions.',
    });
    expect(res.body.hidden).toBe(true);
    expect((await request(t.app).get(`/api/listings/${listing.id}`)).status).toBe(404);
    expect((await a.get(`/api/listings/${listing.id}`)).body).toMatchObject({
      hidden: true,
      hiddenNote: 'Selling mains-powered gear without cautions.',
    });
    const audit = await mod.get(`/api/review/audit?targetType=listing&targetId=${listing.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'listing.hide' });
    const maker = await signIn(t, (await createUser()).login);
    expectError(await send(maker, 'post', `/api/listings/${listing.id}/visibility`, { hidden: false, note: 'x' }), 403, 'forbidden');
  });
});

describe('messages', () => {
  test('when a maker writes to a listing owner, then the message is stored, the owner is e-mailed with a link, and no address leaks', async () => {
    const { owner, a: ownerAgent, listing } = await ownerWithListing();
    const buyer = await createUser();
    const b = await signIn(t, buyer.login);
    const res = await send(b, 'post', `/api/listings/${listing.id}/messages`, {
      body: 'Are the bars still available? I can pay by bank transfer.',
    });
    expect(res.status).toBe(201);
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes(buyer.login));
    expect(mail.text).toContain(`${t.config.publicUrl}/inbox/${res.body.threadId}`);
    expect(mail.text).toContain('Are the bars still available?');
    expect(mail.text + mail.html + mail.from).not.toContain(standInEmail(buyer.login));
    const inbox = await ownerAgent.get('/api/inbox');
    expect(inbox.body.threads[0]).toMatchObject({ id: res.body.threadId, other: { login: buyer.login }, role: 'owner', unread: 1 });
    expect(JSON.stringify(inbox.body)).not.toContain('@');
    const thread = await ownerAgent.get(`/api/inbox/${res.body.threadId}`);
    expect(thread.body.messages).toMatchObject([{ fromMe: false, sender: buyer.login }]);
    const reply = await send(ownerAgent, 'post', `/api/inbox/${res.body.threadId}/messages`, { body: 'Yes, two left.' });
    expect(reply.status).toBe(201);
    const back = await t.mail.waitFor((m) => m.to.includes(standInEmail(buyer.login)) && m.text.includes('Yes, two left.'));
    expect(back.text + back.html).not.toContain(standInEmail(owner.login));
    expect((await b.get(`/api/inbox/${res.body.threadId}`)).body.messages.map((m: { body: string }) => m.body)).toEqual([
      'Are the bars still available? I can pay by bank transfer.',
      'Yes, two left.',
    ]);
  });

  test('when a thread is read with GET, then nothing changes; POST …/read marks the other party’s messages read, for its parties only', async () => {
    const { a: ownerAgent, listing } = await ownerWithListing();
    const b = await signIn(t, (await createUser()).login);
    const sent = await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: 'Is the stack still there?' });
    const path = `/api/inbox/${sent.body.threadId}`;
    const unread = async () =>
      (await ownerAgent.get('/api/inbox')).body.threads.find((th: { id: number }) => th.id === sent.body.threadId).unread;
    for (let i = 0; i < 2; i++) expect((await ownerAgent.get(path)).status).toBe(200);
    expect((await ownerAgent.get(path)).body.unread).toBe(1);
    expect(await unread()).toBe(1);
    expect((await Message.findAll({ where: { threadId: sent.body.threadId } })).map((m) => m.readAt)).toEqual([null]);
    const outsider = await signIn(t, (await createUser()).login);
    expectError(await send(outsider, 'post', `${path}/read`, {}), 404, 'not_found');
    expectError(await request(t.app).post(`${path}/read`), 403, 'csrf_failed');
    expectError(await send(ownerAgent, 'post', '/api/inbox/999999999/read', {}), 404, 'not_found');
    expect(await unread()).toBe(1);
    // The sender marking it read changes nothing: only the other party's messages are marked.
    expect((await send(b, 'post', `${path}/read`, {})).status).toBe(204);
    expect(await unread()).toBe(1);
    expect((await send(ownerAgent, 'post', `${path}/read`, {})).status).toBe(204);
    expect(await unread()).toBe(0);
  });

  test.each([
    ['closed', { status: 'closed' }, 'listing_closed'],
    ['hidden by a moderator', { hiddenAt: new Date(), hiddenNote: 'No cautions.' }, 'listing_hidden'],
  ] as const)(
    'when the listing is %s, then new messages are refused with 409 in new and existing threads, and nothing is stored',
    async (_what, change, code) => {
      const { a: ownerAgent, listing } = await ownerWithListing();
      const b = await signIn(t, (await createUser()).login);
      const sent = await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: 'Still there?' });
      expect(sent.status).toBe(201);
      await Listing.update(change, { where: { id: listing.id } });
      const path = `/api/inbox/${sent.body.threadId}/messages`;
      expectError(await send(b, 'post', path, { body: 'Hello again?' }), 409, code);
      expectError(await send(ownerAgent, 'post', path, { body: 'Sold, sorry.' }), 409, code);
      const moderator = await signIn(t, (await createUser({ role: 'moderator' })).login);
      // A new conversation: refused for whoever may still see the listing (another maker cannot see a hidden one).
      expectError(await send(moderator, 'post', `/api/listings/${listing.id}/messages`, { body: 'A question' }), 409, code);
      const late = await send(await signIn(t, (await createUser()).login), 'post', `/api/listings/${listing.id}/messages`, {
        body: 'Mine?',
      });
      expect([404, 409]).toContain(late.status);
      expect((await Message.findAll({ where: { threadId: sent.body.threadId } })).map((m) => m.body)).toEqual(['Still there?']);
      expect(await MessageThread.count({ where: { listingId: listing.id } })).toBe(1);
    },
  );

  test('when the owner writes to their own listing, an outsider reads a thread, or the body is empty, then 403 / 404 / 400', async () => {
    const { a, listing } = await ownerWithListing();
    expectError(await send(a, 'post', `/api/listings/${listing.id}/messages`, { body: 'me' }), 403, 'forbidden');
    const b = await signIn(t, (await createUser()).login);
    const sent = await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: 'hello' });
    const outsider = await signIn(t, (await createUser()).login);
    expectError(await outsider.get(`/api/inbox/${sent.body.threadId}`), 404, 'not_found');
    expectError(await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: '   ' }), 400, 'validation_failed', 'body');
    expectError(await request(t.app).get('/api/inbox'), 401, 'unauthorized');
  });

  test('when a sender exceeds the message limit, then 429 in the error shape and nothing more is stored', async () => {
    const limited = await startTestApp({ rateLimits: true });
    try {
      const owner = await createUser();
      const part = await createPart();
      const oa = await signIn(limited, owner.login);
      const listing = (
        await send(oa, 'post', '/api/listings', {
          partId: part.id,
          kind: 'offering',
          quantity: 1,
          condition: 'new',
          priceKind: 'free',
          region: 'Here',
        })
      ).body;
      const b = await signIn(limited, (await createUser()).login);
      const statuses = [];
      for (let i = 0; i < 22; i++) statuses.push((await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: `n${i}` })).status);
      expect(statuses.slice(0, 20).every((s) => s === 201)).toBe(true);
      const last = await send(b, 'post', `/api/listings/${listing.id}/messages`, { body: 'one more' });
      expect(last.status).toBe(429);
      expect(last.body).toMatchObject({ error: { code: 'rate_limited' } });
      expect(await Message.count({ where: { body: 'one more' } })).toBe(0);
    } finally {
      await limited.close();
      t.rebind();
    }
  });
});
