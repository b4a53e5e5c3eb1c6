// What the token and idempotency tests share: a maker with a draft build and an actuator, a token
// made through the account API, and a run body as a rig would send it.
import { expect } from 'vitest';
import type { TokenScope } from '../../shared/schemas/api-token.ts';
import type { TestApp } from './test-app.ts';
import { signIn, type Agent } from './login.ts';
import { createActuatorRow, createBuildRow, createPart, createUser } from './factories.ts';

/** Points of a 4.2 nm/V bar read by a capacitive sensor (a straight line through the origin) [calc]. */
export const rigRun = (gain = 4.2) => ({
  method: 'capacitive',
  voltageUnit: 'V',
  displacementUnit: 'nm',
  points: [0, 10, 20, 30, 40].map((volts) => ({ volts, displacement: gain * volts })),
});

/** An actuator on a new draft build of `ownerId`. */
export async function actuatorOf(ownerId: number) {
  const build = await createBuildRow(ownerId);
  const part = await createPart();
  const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
  return { build, actuator };
}

/** A new maker, signed in, with one actuator on a draft build. */
export async function makerWithActuator(t: TestApp) {
  const user = await createUser();
  const agent = await signIn(t, user.login);
  return { user, agent, ...(await actuatorOf(user.id)) };
}

/** A token made on the account API by this signed-in agent; returns the secret and the answer. */
export async function makeToken(agent: Agent, scopes: TokenScope[], name = 'bench rig') {
  const res = await agent.post('/api/account/tokens').set('X-CSRF-Token', agent.csrf).send({ name, scopes });
  expect(res.status, res.text).toBe(201);
  return { secret: res.body.token as string, id: res.body.id as number, body: res.body };
}
