import type { Actor } from '@shared/policies.ts';
import { DATA_LICENCE } from '@shared/data-licence.ts';
import type { DataLicenceAcceptanceDto } from '@shared/schemas/data-licence.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';

const present = (u: User): DataLicenceAcceptanceDto => ({
  licence: DATA_LICENCE,
  acceptedAt: u.dataLicenceAcceptedAt?.toISOString() ?? null,
});

async function loadSelf(actor: Actor | null): Promise<User> {
  authorize(actor, 'account.update-settings', { userId: actor?.id });
  const user = await User.findByPk(actor.id, { attributes: ['id', 'dataLicenceAcceptedAt'] });
  if (!user) throw new NotFoundError();
  return user;
}

/** Whether the signed-in maker has accepted the data licence. */
export async function getDataLicenceAcceptance(actor: Actor | null): Promise<DataLicenceAcceptanceDto> {
  return present(await loadSelf(actor));
}

/**
 * The maker accepts the data licence for everything they contribute. Accepting again keeps the first date
 * (a conditional update, so two clicks at once cannot move it either).
 */
export async function acceptDataLicence(actor: Actor | null): Promise<DataLicenceAcceptanceDto> {
  const user = await loadSelf(actor);
  if (!user.dataLicenceAcceptedAt) {
    await User.update({ dataLicenceAcceptedAt: new Date() }, { where: { id: user.id, dataLicenceAcceptedAt: null } });
    await user.reload({ attributes: ['id', 'dataLicenceAcceptedAt'] });
  }
  return present(user);
}
