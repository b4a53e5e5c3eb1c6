// Single-line fields refuse control characters and lone surrogates with a 400 naming the field; nothing is stored
// (a lone surrogate would otherwise reach MariaDB's utf8mb4 as "?").
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { Build } from '../../server/models/build.model.ts';
import { Part } from '../../server/models/part.model.ts';

let t: TestApp;
let maker: Agent;
let makerId: number;
beforeAll(async () => {
  t = await startTestApp();
  const u = await createUser();
  makerId = u.id;
  maker = await signIn(t, u.login);
});
afterAll(async () => {
  await t.close();
});

/** Send a JSON text as written, so escapes like \ud800 reach the parser unchanged. */
const raw = (method: 'post' | 'patch', path: string, json: string) =>
  maker[method](path).set('X-CSRF-Token', maker.csrf).set('Content-Type', 'application/json').send(json);

const BAD: Array<[string, string]> = [
  ['NUL', '\\u0000'],
  ['LF', '\\n'],
  ['CR', '\\r'],
  ['TAB', '\\t'],
  ['C1 (U+0085)', '\\u0085'],
  ['a lone surrogate', '\\ud800'],
];

describe('single-line fields', () => {
  test.each(BAD)('when a build title holds %s, then 400 on title and no build is made', async (_what, esc) => {
    const title = `Shed STM ${Math.random().toString(36).slice(2)}`;
    const res = await raw(
      'post',
      '/api/builds',
      `{"title":"${title}${esc}x","instrumentKind":"tunnelling-microscope","summary":"A tube STM."}`,
    );
    expectError(res, 400, 'validation_failed', 'title');
    expect(await Build.count({ where: { ownerId: makerId } })).toBe(0);
  });

  test.each(BAD)('when a part name, listing region, actuator label or token name holds %s, then 400 on that field', async (_what, esc) => {
    const part = await createPart();
    const build = await createBuildRow(makerId);
    expectError(await raw('post', '/api/parts', `{"category":"buzzer-disc","name":"Disc${esc}27"}`), 400, 'validation_failed', 'name');
    expectError(
      await raw(
        'post',
        '/api/listings',
        `{"partId":${part.id},"kind":"offering","quantity":1,"condition":"new","priceKind":"free","region":"Here${esc}"}`,
      ),
      400,
      'validation_failed',
      'region',
    );
    expectError(
      await raw('post', `/api/builds/${build.id}/actuators`, `{"partId":${part.id},"axis":"Z","drive":"single","label":"Z${esc}tube"}`),
      400,
      'validation_failed',
      'label',
    );
    expectError(await raw('post', '/api/account/tokens', `{"name":"rig${esc}","scopes":["read"]}`), 400, 'validation_failed', 'name');
    expectError(await raw('patch', `/api/builds/${build.id}`, `{"title":"Renamed${esc}"}`), 400, 'validation_failed', 'title');
    expect((await Build.findByPk(build.id))?.title).toBe(build.title);
  });

  test('when a search holds a control character, then 400 on q; a lone low surrogate in a name is refused too', async () => {
    expectError(await maker.get('/api/parts?q=disc%0A27'), 400, 'validation_failed', 'q');
    expectError(await maker.get('/api/builds?q=%00'), 400, 'validation_failed', 'q');
    expectError(await raw('post', '/api/parts', '{"category":"buzzer-disc","name":"Disc \\udfff 27"}'), 400, 'validation_failed', 'name');
  });

  test('when text is well formed (accents, an emoji, a line break in a note), then it is stored exactly', async () => {
    const name = `Disc Ø27 ±150 V 🔬 ${Math.random().toString(36).slice(2, 6)}`;
    const res = await raw('post', '/api/parts', JSON.stringify({ category: 'buzzer-disc', name, notes: 'First line\nsecond line' }));
    expect(res.status, res.text).toBe(201);
    expect(await Part.findByPk(res.body.id)).toMatchObject({ name, notes: 'First line\nsecond line' });
  });
});
