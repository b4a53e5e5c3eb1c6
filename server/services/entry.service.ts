import type { Actor } from '@shared/policies.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { CreateEntryInput, LogEntryDto, UpdateEntryInput } from '@shared/schemas/build.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { Photo } from '../models/photo.model.ts';
import { Build } from '../models/build.model.ts';
import { NotFoundError } from '../errors.ts';
import { loadBuildForEdit, markEdited } from './build-access.ts';
import { announceEntry } from './news.service.ts';
import { presentPhoto } from '../presenters/photo.presenter.ts';

async function present(entry: LogEntry): Promise<LogEntryDto> {
  const photos = await Photo.findAll({
    where: { entryId: entry.id },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return { id: entry.id, entryDate: entry.entryDate, title: entry.title, body: entry.body, photos: photos.map(presentPhoto) };
}

async function loadEntry(buildId: number, entryId: number, transaction: Parameters<typeof loadBuildForEdit>[2]) {
  const entry = await LogEntry.findOne({ where: { id: entryId, buildId }, transaction });
  if (!entry) throw new NotFoundError('No such log entry in this build.');
  return entry;
}

/** Add a dated entry to one's own build. */
export async function createEntry(actor: Actor | null, buildId: number, input: CreateEntryInput): Promise<LogEntryDto> {
  const entry = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const e = await LogEntry.create({ buildId, ...input }, { transaction });
    await markEdited(build, transaction);
    await announceEntry(build, e, transaction);
    return e;
  });
  return present(entry);
}

/** Change an entry's date, title or text. */
export async function updateEntry(actor: Actor | null, buildId: number, entryId: number, input: UpdateEntryInput): Promise<LogEntryDto> {
  const entry = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const e = await loadEntry(buildId, entryId, transaction);
    await e.update(input, { transaction });
    await markEdited(build, transaction);
    return e;
  });
  return present(entry);
}

/** Remove an entry; its photos stay with the build (detached from the entry). */
export async function deleteEntry(actor: Actor | null, buildId: number, entryId: number): Promise<void> {
  await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const e = await loadEntry(buildId, entryId, transaction);
    await Photo.update({ entryId: null }, { where: { entryId: e.id }, transaction });
    await e.destroy({ transaction });
    await markEdited(build, transaction);
  });
}
