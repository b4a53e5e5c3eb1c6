import { afterAll, beforeAll } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from './test-app.ts';

/**
 * A test app for one file and a `post(slug, body)` to its workbench routes. The calculations carry a
 * session's CSRF token like any page would, so their checks do not hinge on the CSRF exemption.
 */
export function workbenchClient() {
  let t: TestApp;
  let agent: ReturnType<typeof request.agent>;
  let csrf = '';
  beforeAll(async () => {
    t = await startTestApp();
    agent = request.agent(t.app);
    csrf = (await agent.get('/api/session')).body.csrfToken;
  });
  afterAll(async () => {
    await t.close();
  });
  return {
    post: (slug: string, body: unknown) =>
      agent
        .post(`/api/workbench/${slug}`)
        .set('X-CSRF-Token', csrf)
        .send(body as object),
    app: () => t.app,
  };
}
