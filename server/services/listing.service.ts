import { Op, type WhereOptions } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import {
  priceLabel,
  type CreateListingInput,
  type HideListingInput,
  type ListListingsQuery,
  type ListingDto,
  type ListingListDto,
  type UpdateListingInput,
} from '@shared/schemas/listing.ts';
import { Listing } from '../models/listing.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError, ValidationError } from '../errors.ts';
import { recordAudit } from './audit.service.ts';
import { containsPattern } from '../db/like-pattern.ts';
import { photosBySubject } from './attached-photos.service.ts';
import { loadListingForView } from './listing-access.ts';

/** Listings with their parts, owners and photos in a fixed number of queries. */
async function presentListings(actor: Actor | null, rows: Listing[]): Promise<ListingDto[]> {
  if (rows.length === 0) return [];
  const [parts, owners, photos] = await Promise.all([
    Part.findAll({ where: { id: [...new Set(rows.map((r) => r.partId))] }, attributes: ['id', 'name', 'category', 'gainMedianNmPerV'] }),
    User.findAll({ where: { id: [...new Set(rows.map((r) => r.ownerId))] }, attributes: ['id', 'login'] }),
    photosBySubject(
      'listing',
      rows.map((r) => r.id),
    ),
  ]);
  const partMap = new Map(parts.map((p) => [p.id, p]));
  const ownerMap = new Map(owners.map((u) => [u.id, u]));
  return rows.map((l) => {
    const part = partMap.get(l.partId)!;
    return {
      id: l.id,
      kind: l.kind,
      part: { id: part.id, name: part.name, category: part.category, gainMedianNmPerV: part.gainMedianNmPerV },
      quantity: l.quantity,
      condition: l.condition,
      priceKind: l.priceKind,
      priceAmount: l.priceAmount,
      currency: l.currency,
      priceLabel: priceLabel(l.priceKind, l.priceAmount, l.currency),
      region: l.region,
      shipsTo: l.shipsTo,
      notes: l.notes,
      status: l.status,
      hidden: l.hiddenAt !== null,
      hiddenNote: can(actor, 'listing.view-hidden', { ownerId: l.ownerId }) ? l.hiddenNote : null,
      owner: { id: l.ownerId, login: ownerMap.get(l.ownerId)?.login ?? 'unknown' },
      photos: photos.get(l.id) ?? [],
      createdAt: l.createdAt.toISOString(),
      updatedAt: l.updatedAt.toISOString(),
      abilities: {
        edit: can(actor, 'listing.edit', { ownerId: l.ownerId }),
        message: can(actor, 'listing.message', { ownerId: l.ownerId }) && l.status !== 'closed' && l.hiddenAt === null,
        hide: can(actor, 'listing.hide'),
      },
    };
  });
}

/** Open and reserved listings that are not hidden, newest first, with the exchange's filters. */
export async function listListings(actor: Actor | null, q: ListListingsQuery): Promise<ListingListDto> {
  const where: Record<string | symbol, unknown> = { status: { [Op.ne]: 'closed' }, hiddenAt: null };
  if (q.kind) where.kind = q.kind;
  if (q.condition) where.condition = q.condition;
  if (q.partId) where.partId = q.partId;
  if (q.freeOnly) where.priceKind = 'free';
  if (q.region) where.region = { [Op.like]: containsPattern(q.region) };
  const partWhere: Record<string | symbol, unknown> = {};
  if (q.category) partWhere.category = q.category;
  if (q.q) partWhere[Op.or] = [{ name: { [Op.like]: containsPattern(q.q) } }, { salvageSource: { [Op.like]: containsPattern(q.q) } }];
  if (q.category || q.q) {
    const parts = await Part.findAll({ where: partWhere, attributes: ['id'], limit: 5000 });
    const ids = parts.map((p) => p.id);
    where[Op.and] = q.q
      ? [{ [Op.or]: [{ partId: ids }, { notes: { [Op.like]: containsPattern(q.q) } }] }, ...(q.category ? [{ partId: ids }] : [])]
      : [{ partId: ids }];
  }
  const { rows, count } = await Listing.findAndCountAll({
    where: where as WhereOptions<Listing>,
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  return { items: await presentListings(actor, rows), total: count, page: q.page, pageSize: q.pageSize };
}

export async function getListing(actor: Actor | null, listingId: number): Promise<ListingDto> {
  const [dto] = await presentListings(actor, [await loadListingForView(actor, listingId)]);
  return dto!;
}

/** The signed-in maker's own listings, any state. */
export async function listMyListings(actor: Actor | null): Promise<ListingListDto> {
  authorize(actor, 'content.create');
  const rows = await Listing.findAll({ where: { ownerId: actor.id }, order: [['updatedAt', 'DESC']], limit: 500 });
  return { items: await presentListings(actor, rows), total: rows.length, page: 1, pageSize: rows.length };
}

async function assertListedPart(partId: number) {
  const part = await Part.findOne({ where: { id: partId, status: 'accepted' } });
  if (!part) throw new ValidationError('Pick a part from the registry.', [{ path: 'partId', message: 'No such listed part.' }]);
}

const priceFields = (input: Partial<CreateListingInput>) =>
  input.priceKind === undefined
    ? {}
    : input.priceKind === 'price'
      ? { priceAmount: input.priceAmount ?? null, currency: input.currency ?? null }
      : { priceAmount: null, currency: null };

/** Offer or seek a listed part. */
export async function createListing(actor: Actor | null, input: CreateListingInput): Promise<ListingDto> {
  authorize(actor, 'content.create');
  await assertListedPart(input.partId);
  const listing = await Listing.create({
    ownerId: actor.id,
    partId: input.partId,
    kind: input.kind,
    quantity: input.quantity,
    condition: input.condition,
    priceKind: input.priceKind,
    priceAmount: null,
    currency: null,
    ...priceFields(input),
    region: input.region,
    shipsTo: input.shipsTo ?? null,
    notes: input.notes ?? null,
  });
  return getListing(actor, listing.id);
}

/** The owner edits a listing or moves it open → reserved → closed (and back while not closed). */
export async function updateListing(actor: Actor | null, listingId: number, input: UpdateListingInput): Promise<ListingDto> {
  const listing = await loadListingForView(actor, listingId);
  authorize(actor, 'listing.edit', { ownerId: listing.ownerId });
  if (input.partId !== undefined) await assertListedPart(input.partId);
  if (listing.status === 'closed' && input.status !== undefined && input.status !== 'closed') {
    throw new ValidationError('A closed listing stays closed; post a new one.', [
      { path: 'status', message: 'Closed listings cannot reopen.' },
    ]);
  }
  const kind = input.priceKind ?? listing.priceKind;
  const amount = input.priceAmount !== undefined ? input.priceAmount : listing.priceAmount;
  const currency = input.currency !== undefined ? input.currency : listing.currency;
  if (kind === 'price' && (amount == null || !currency))
    throw new ValidationError('A price needs an amount and a currency.', [{ path: 'priceAmount', message: 'Required for a price.' }]);
  await listing.update({ ...input, ...priceFields({ priceKind: kind, priceAmount: amount, currency }) });
  return getListing(actor, listing.id);
}

/** A moderator hides (or shows again) a listing, with a note on the audit trail. */
export async function hideListing(actor: Actor | null, listingId: number, input: HideListingInput): Promise<ListingDto> {
  authorize(actor, 'listing.hide');
  await Listing.sequelize!.transaction(async (transaction) => {
    const listing = await Listing.findByPk(listingId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!listing) throw new NotFoundError('No such listing.');
    await listing.update({ hiddenAt: input.hidden ? new Date() : null, hiddenNote: input.hidden ? input.note : null }, { transaction });
    await recordAudit(
      actor,
      { action: input.hidden ? 'listing.hide' : 'listing.unhide', targetType: 'listing', targetId: listing.id, note: input.note },
      transaction,
    );
  });
  return getListing(actor, listingId);
}
