import { Op, type WhereOptions } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import type { ListPartsQuery, PartListDto, PartSummaryDto } from '@shared/schemas/part.ts';
import { Part } from '../models/part.model.ts';
import { NotFoundError } from '../errors.ts';
import { presentPartSummary } from '../presenters/part.presenter.ts';

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Listed parts (accepted, not merged away), by name or salvage source and category. */
export async function listParts(query: ListPartsQuery): Promise<PartListDto> {
  const where: WhereOptions<Part> = { status: 'accepted', mergedIntoId: null };
  if (query.category) Object.assign(where, { category: query.category });
  if (query.q) {
    const like = `%${escapeLike(query.q)}%`;
    Object.assign(where, { [Op.or]: [{ name: { [Op.like]: like } }, { salvageSource: { [Op.like]: like } }] });
  }
  const { rows, count } = await Part.findAndCountAll({
    where,
    order: [['name', 'ASC'], ['id', 'ASC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { items: rows.map(presentPartSummary), total: count, page: query.page, pageSize: query.pageSize };
}

/** One part: listed ones for everyone; a proposed or rejected one only for its proposer and moderators. */
export async function getPart(actor: Actor | null, partId: number): Promise<PartSummaryDto> {
  const part = await Part.findByPk(partId);
  if (!part || (part.status !== 'accepted' && !can(actor, 'part.view-unlisted', { ownerId: part.proposedById }))) {
    throw new NotFoundError('No such part.');
  }
  return presentPartSummary(part);
}
