import { Op } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import type {
  ListPartsQuery,
  PartDetailDto,
  PartListDto,
  PartListItemDto,
  ProposePartInput,
  GainHistogramDto,
} from '@shared/schemas/part.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';
import { presentPartDetail, type PartPageRows } from '../presenters/part.presenter.ts';
import { countParts, countUnratedHidden, selectParts } from './part-search.sql.ts';
import { cachedRegistryCount } from './registry-count-cache.ts';
import { canEditPartPhotos, photosBySubject } from './attached-photos.service.ts';
import { cachedPublicRead } from './public-read-cache.ts';
import { selectPartListings, selectPartRuns } from './part-page.sql.ts';

/** Most rows one export returns. */
export const EXPORT_LIMIT = 10_000;

/** Registry search with server-side filters, sort and paging (totals cached briefly, see registry-count-cache). */
export async function listParts(q: ListPartsQuery): Promise<PartListDto> {
  const sequelize = Part.sequelize!;
  const key = [q.q, q.category, q.gainMin, q.gainMax, q.minRuns, q.minVolts, q.maxVolts, q.unrated];
  const [rows, total, unratedHidden] = await Promise.all([
    selectParts(sequelize, q, q.pageSize, (q.page - 1) * q.pageSize),
    cachedRegistryCount(JSON.stringify(key), () => countParts(sequelize, q)),
    cachedRegistryCount(JSON.stringify(['unrated', ...key]), () => countUnratedHidden(sequelize, q)),
  ]);
  return { items: rows, total, unratedHidden, page: q.page, pageSize: q.pageSize };
}

/** The whole current search (up to EXPORT_LIMIT rows) for CSV or JSON download. */
export async function exportParts(q: ListPartsQuery): Promise<PartListItemDto[]> {
  return selectParts(Part.sequelize!, q, EXPORT_LIMIT, 0);
}

/** Accepted part medians in log-spaced bins (5 per decade) for the range control's histogram. */
export async function gainHistogram(): Promise<GainHistogramDto> {
  const perDecade = 5;
  const rows = (await Part.findAll({
    where: { status: 'accepted', gainMedianNmPerV: { [Op.gt]: 0 } },
    attributes: [
      [Part.sequelize!.literal(`FLOOR(LOG10(gain_median_nm_per_v) * ${perDecade})`), 'bin'],
      [Part.sequelize!.fn('COUNT', Part.sequelize!.col('id')), 'count'],
    ],
    group: ['bin'],
    order: [[Part.sequelize!.literal('bin'), 'ASC']],
    raw: true,
  })) as unknown as { bin: number; count: number }[];
  return {
    binsPerDecade: perDecade,
    bins: rows.map((r) => ({
      fromNmPerV: 10 ** (Number(r.bin) / perDecade),
      toNmPerV: 10 ** ((Number(r.bin) + 1) / perDecade),
      count: Number(r.count),
    })),
  };
}

/** A part with everything its page lists, whoever looks: five queries however many runs or listings, cached briefly. */
async function loadPartPage(partId: number): Promise<{ part: Part; rows: PartPageRows } | null> {
  const sequelize = Part.sequelize!;
  const part = await Part.findByPk(partId);
  if (!part) return null;
  const [runs, listings, proposer, photos] = await Promise.all([
    selectPartRuns(sequelize, partId, 2000),
    selectPartListings(sequelize, partId, 50),
    part.proposedById ? User.findByPk(part.proposedById, { attributes: ['login'] }) : null,
    photosBySubject('part', [part.id]),
  ]);
  return { part, rows: { proposedBy: proposer?.login ?? null, runs, listings, photos: photos.get(part.id) ?? [] } };
}

/** One part: listed ones for everyone; a proposed or rejected one only for its proposer and moderators. */
export async function getPart(actor: Actor | null, partId: number): Promise<PartDetailDto> {
  const page = await cachedPublicRead(Part.sequelize!, `part-page:${partId}`, () => loadPartPage(partId));
  const part = page?.part;
  if (!page || !part || (part.status !== 'accepted' && !can(actor, 'part.view-unlisted', { ownerId: part.proposedById }))) {
    throw new NotFoundError('No such part.');
  }
  return presentPartDetail(part, page.rows, canEditPartPhotos(actor, part));
}

/** A maker proposes a part; it waits on the review desk until a moderator accepts it. */
export async function proposePart(actor: Actor | null, input: ProposePartInput): Promise<{ id: number; status: string }> {
  authorize(actor, 'content.create');
  const part = await Part.create({
    category: input.category,
    name: input.name,
    salvageSource: input.salvageSource ?? null,
    material: input.material ?? null,
    lengthMm: input.lengthMm ?? null,
    widthMm: input.widthMm ?? null,
    thicknessMm: input.thicknessMm ?? null,
    outerDiameterMm: input.outerDiameterMm ?? null,
    wallMm: input.wallMm ?? null,
    layers: input.layers ?? null,
    capacitanceNf: input.capacitanceNf ?? null,
    safeVolts: input.safeVolts ?? null,
    notes: input.notes ?? null,
    proposedById: actor.id,
  });
  return { id: part.id, status: part.status };
}
