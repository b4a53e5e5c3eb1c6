import type { Actor } from '@shared/policies.ts';
import type { AccountSettingsInput } from '@shared/schemas/review.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';
import { choicesOf, setChoices } from './mail-choices.service.ts';

/** The signed-in person's own settings. */
export async function getAccountSettings(actor: Actor | null) {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const user = await User.findByPk(actor.id);
  if (!user) throw new NotFoundError();
  return { mailOptOut: user.mailOptOut, mailChoices: choicesOf(user), email: user.email };
}

/** Turn non-essential mail (run and part decisions, report outcomes, welcome) on or off, and each kind of mail on or off. */
export async function updateAccountSettings(actor: Actor | null, input: AccountSettingsInput) {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  if (input.mailOptOut !== undefined) await User.update({ mailOptOut: input.mailOptOut }, { where: { id: actor.id } });
  if (input.mailChoices) await setChoices(actor, input.mailChoices);
  return getAccountSettings(actor);
}
