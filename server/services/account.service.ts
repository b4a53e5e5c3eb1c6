import type { Actor } from '@shared/policies.ts';
import type { AccountSettingsInput } from '@shared/schemas/review.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';

/** The signed-in person's own settings. */
export async function getAccountSettings(actor: Actor | null) {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const user = await User.findByPk(actor.id);
  if (!user) throw new NotFoundError();
  return { mailOptOut: user.mailOptOut, email: user.email };
}

/** Turn non-essential mail (run and part decisions, report outcomes, welcome) on or off. */
export async function updateAccountSettings(actor: Actor | null, input: AccountSettingsInput) {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  await User.update({ mailOptOut: input.mailOptOut }, { where: { id: actor.id } });
  return getAccountSettings(actor);
}
