import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  test('when the database answers, then 200 with db up', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'up' });
  });

  test('when the database is unreachable, then 503 with db down', async () => {
    const down = await startTestApp({ db: { ...t.config.db, port: 1 } });
    try {
      const res = await request(down.app).get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toMatchObject({ db: 'down' });
    } finally {
      await down.close();
      t.rebind();
    }
  });
});

describe('errors', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  test('when a body is malformed JSON, then 400 malformed_json in the error shape', async () => {
    const res = await request(t.app).post('/api/workbench/fit').set('Content-Type', 'application/json').send('{"points": [1, 2');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'malformed_json', message: expect.any(String) } });
  });

  test('when an API route does not exist, then 404 JSON', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toMatchObject({ error: { code: 'not_found' } });
    expect(res.headers['content-type']).toMatch(/json/);
  });

  test('when the database is unreachable, then a data route answers 503 in the error shape, not a hang', async () => {
    const u = await createUser();
    const cookie = (await (await signIn(t, u.login)).get('/api/session')).request.cookies;
    const down = await startTestApp({ db: { ...t.config.db, port: 1 } });
    try {
      const res = await request(down.app).get('/api/session').set('Cookie', cookie);
      expect(res.status).toBe(503);
      expect(res.body).toMatchObject({ error: { code: 'db_unavailable' } });
    } finally {
      await down.close();
      t.rebind();
    }
  });

  test('when an error reaches the handler in production, then no stack trace leaks', async () => {
    const res = await request(t.app).get('/api/admin/users?page=abc');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});
