import request from 'supertest';
import type { TestApp } from './test-app.ts';

export type Agent = ReturnType<typeof request.agent> & { csrf: string };

/** A cookie-keeping client with the session's CSRF token, not signed in. */
export async function visitor(t: TestApp): Promise<Agent> {
  const agent = request.agent(t.app) as Agent;
  const res = await agent.get('/api/session').expect(200);
  agent.csrf = res.body.csrfToken;
  return agent;
}

/**
 * Sign in for real: /auth/github → the OAuth stand-in (with GitHub's `login` hint) → callback.
 * Returns the agent with the new session's CSRF token.
 */
export async function signIn(t: TestApp, login: string): Promise<Agent> {
  const agent = request.agent(t.app) as Agent;
  const start = await agent.get(`/auth/github?login=${encodeURIComponent(login)}`).expect(302);
  const atProvider = await fetch(start.headers.location, { redirect: 'manual' });
  const callback = new URL(atProvider.headers.get('location')!);
  const done = await agent.get(`${callback.pathname}${callback.search}`);
  if (done.status !== 302 || done.headers.location !== '/') throw new Error(`sign-in as ${login} ended at ${done.headers.location}`);
  const session = await agent.get('/api/session').expect(200);
  if (session.body.user?.login !== login.toLowerCase()) throw new Error(`signed in as ${JSON.stringify(session.body.user)}`);
  agent.csrf = session.body.csrfToken;
  return agent;
}
