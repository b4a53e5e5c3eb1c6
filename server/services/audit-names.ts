import type { Transaction } from 'sequelize';
import { runName } from '@shared/review/run-name.ts';
import { Actuator } from '../models/actuator.model.ts';
import type { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import type { ApiToken } from '../models/api-token.model.ts';
import type { Listing } from '../models/listing.model.ts';
import { User as UserModel } from '../models/user.model.ts';

/** The run columns `nameRun` reads. */
export const RUN_NAME_COLUMNS = [
  'id',
  'ownerId',
  'actuatorId',
  'partId',
  'measuredOn',
  'createdAt',
  'gainNmPerV',
  'gainCi95LoNmPerV',
  'gainCi95HiNmPerV',
  'gainStdErrNmPerV',
] as const;

/** A run as the audit trail and the decision mails name it: its actuator (or part), date and gain with its ±. */
export async function nameRun(run: Pick<CalibrationRun, (typeof RUN_NAME_COLUMNS)[number]>, transaction?: Transaction): Promise<string> {
  const [actuator, part] = await Promise.all([
    Actuator.findByPk(run.actuatorId, { transaction, attributes: ['id', 'label'] }),
    Part.findByPk(run.partId, { transaction, attributes: ['id', 'name'] }),
  ]);
  return runName({
    actuatorLabel: actuator?.label ?? null,
    partName: part?.name ?? `part ${run.partId}`,
    measuredOn: run.measuredOn,
    createdAt: run.createdAt,
    gainNmPerV: run.gainNmPerV,
    gainCi95NmPerV: [run.gainCi95LoNmPerV, run.gainCi95HiNmPerV],
    gainStdUncertaintyNmPerV: run.gainStdErrNmPerV,
  });
}

/** An account by handle and name, as it was when an admin acted on it: "@rohan (Rohan)". */
export const nameUser = (user: Pick<UserModel, 'login' | 'name'>): string =>
  user.name && user.name !== user.login ? `@${user.login} (${user.name})` : `@${user.login}`;

/** A token by its name and number, and whose it is: "token “bench rig” #12 of @rohan". */
export const nameToken = (token: Pick<ApiToken, 'name' | 'id'>, owner: Pick<UserModel, 'login' | 'name'>): string =>
  `token “${token.name}” #${token.id} of ${nameUser(owner)}`;

/** A listing by what it offers or seeks and whose it is: "offering · Cartridge bar by @marit-builds". */
export async function nameListing(listing: Listing, transaction?: Transaction): Promise<string> {
  const [part, owner] = await Promise.all([
    Part.findByPk(listing.partId, { transaction, attributes: ['id', 'name'] }),
    UserModel.findByPk(listing.ownerId, { transaction, attributes: ['id', 'login', 'name'] }),
  ]);
  return `${listing.kind} · ${part?.name ?? `part ${listing.partId}`} by ${owner ? nameUser(owner) : 'a removed account'}`;
}
