// The moderator's publish note is the owner's (and moderators'), not the public's, unless the moderator marks it public.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { Build } from '../../server/models/build.model.ts';

let t: TestApp;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const publish = (buildId: number, body: object) =>
  mod
    .post(`/api/review/builds/${buildId}/decision`)
    .set('X-CSRF-Token', mod.csrf)
    .send({ decision: 'publish', ...body });

/** The build as a visitor, another maker, its owner and a moderator read it: page and cards. */
async function views(buildId: number, ownerLogin: string, title: string) {
  const other = await signIn(t, (await createUser()).login);
  const owner = await signIn(t, ownerLogin);
  const page = async (a: Agent | null) => (await (a ?? request(t.app)).get(`/api/builds/${buildId}`).expect(200)).body;
  const card = async (a: Agent | null) =>
    (await (a ?? request(t.app)).get(`/api/builds?q=${encodeURIComponent(title)}`).expect(200)).body.items.find(
      (b: { id: number }) => b.id === buildId,
    );
  const mine = (await owner.get('/api/builds/mine').expect(200)).body.items.find((b: { id: number }) => b.id === buildId);
  return {
    visitor: [await page(null), await card(null)],
    other: [await page(other), await card(other)],
    owner: [await page(owner), mine],
    moderator: [await page(mod)],
  };
}

describe('POST /api/review/builds/:id/decision with a publish note', () => {
  test('when the note is not marked public, then the owner and moderators read it and nobody else does', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    expect((await publish(b.id, { note: 'Lovely sweep data; add the preamp schematic some day.' })).status).toBe(200);
    const v = await views(b.id, owner.login, b.title);
    for (const dto of [...v.visitor, ...v.other]) expect(dto).toMatchObject({ reviewNote: null, reviewNotePublic: false });
    for (const dto of [...v.owner, ...v.moderator]) expect(dto.reviewNote).toBe('Lovely sweep data; add the preamp schematic some day.');
  });

  test('when the moderator marks it public, then everyone reads it', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    expect((await publish(b.id, { note: 'A model write-up of a tube calibration.', notePublic: true })).status).toBe(200);
    expect(await Build.findByPk(b.id)).toMatchObject({ reviewNotePublic: true });
    const v = await views(b.id, owner.login, b.title);
    for (const dto of [...v.visitor, ...v.other, ...v.owner, ...v.moderator])
      expect(dto).toMatchObject({ reviewNote: 'A model write-up of a tube calibration.', reviewNotePublic: true });
  });

  test('when a later decision returns the build, then its note is private again', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    await publish(b.id, { note: 'Public praise.', notePublic: true });
    await Build.update({ editedSinceReview: true }, { where: { id: b.id } });
    const ret = await mod
      .post(`/api/review/builds/${b.id}/decision`)
      .set('X-CSRF-Token', mod.csrf)
      .send({ decision: 'return', note: 'The new photos show mains wiring.' });
    expect(ret.status).toBe(200);
    expect(await Build.findByPk(b.id)).toMatchObject({ reviewNotePublic: false, reviewNote: 'The new photos show mains wiring.' });
  });

  test('when notePublic comes with a return, without a note, or is not a boolean, then 400 on notePublic and nothing changes', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    const send = (body: object) => mod.post(`/api/review/builds/${b.id}/decision`).set('X-CSRF-Token', mod.csrf).send(body);
    expectError(await send({ decision: 'return', note: 'Fix it.', notePublic: true }), 400, 'validation_failed', 'notePublic');
    expectError(await send({ decision: 'publish', notePublic: true }), 400, 'validation_failed', 'notePublic');
    expectError(await send({ decision: 'publish', note: 'x', notePublic: 'yes' }), 400, 'validation_failed', 'notePublic');
    expect((await Build.findByPk(b.id))?.status).toBe('submitted');
  });
});
