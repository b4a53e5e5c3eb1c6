import { refusal, type Action, type Actor, type Resource } from '@shared/policies.ts';
import { ForbiddenError, UnauthorizedError } from '../errors.ts';

/** The one gate: 401 for a visitor, 403 for someone the rules refuse. Called only by services. */
export function authorize(actor: Actor | null | undefined, action: Action, resource?: Resource): asserts actor is Actor {
  if (!actor) throw new UnauthorizedError();
  if (actor.suspended) throw new ForbiddenError('This account is suspended.', 'account_suspended');
  const refused = refusal(actor, action, resource);
  if (refused) throw new ForbiddenError(refused.message, refused.code);
}
