import { Op, type WhereOptions } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import {
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
import { nameListing } from './audit-names.ts';
import { containsPattern } from '../db/like-pattern.ts';
import { photosBySubject } from './attached-photos.service.ts';
import { loadListingForView } from './listing-access.ts';
import { cachedPublicRead } from './public-read-cache.ts';
import { presentListing, type ListingExtras } from '../presenters/listing.presenter.ts';

/** Parts, owner logins and photos of several listings: three queries whatever the number of listings. */
async function loadListingExtras(rows: Listing[]): Promise<Map<number, ListingExtras>> {
  const [parts, owners, photos] = await Promise.all([
    Part.findAll({ where: { id: [...new Set(rows.map((r) => r.partId))] }, attributes: ['id', 'name', 'category', 'gainMedianNmPerV'] }),
    User.findAll({ where: { id: [...new Set(rows.map((r) => r.ownerId))] }, attributes: ['id', 'login'] }),
    photosBySubject(
      'listing',
      rows.map((r) => r.id),
    ),
  ]);
  const partMap = new Map(parts.map((p) => [p.id, p]));
  const ownerMap = new Map(owners.map((u) => [u.id, u.login]));
  return new Map(
    rows.map((l) => [
      l.id,
      { part: partMap.get(l.partId)!, ownerLogin: ownerMap.get(l.ownerId) ?? 'unknown', photos: photos.get(l.id) ?? [] },
    ]),
  );
}

/** Listings with their parts, owners and photos in a fixed number of queries, the extras cached briefly (see public-read-cache). */
async function presentListings(actor: Actor | null, rows: Listing[]): Promise<ListingDto[]> {
  if (rows.length === 0) return [];
  const key = `listing-extras:${rows.map((r) => `${r.id}.${r.partId}.${r.ownerId}`).join(',')}`;
  const extras = await cachedPublicRead(Listing.sequelize!, key, () => loadListingExtras(rows));
  return rows.map((l) => presentListing(actor, l, extras.get(l.id)!));
}

/** One page of open, unhidden listings matching the exchange's filters, with the total. */
async function findListings(q: ListListingsQuery): Promise<{ rows: Listing[]; count: number }> {
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
  return { rows, count };
}

/** Open and reserved listings that are not hidden, newest first, with the exchange's filters (the page cached briefly, see public-read-cache). */
export async function listListings(actor: Actor | null, q: ListListingsQuery): Promise<ListingListDto> {
  const { rows, count } = await cachedPublicRead(Listing.sequelize!, `listings:${JSON.stringify(q)}`, () => findListings(q));
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
  await withWriteTransaction(Listing.sequelize!, async (transaction) => {
    const listing = await Listing.findByPk(listingId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!listing) throw new NotFoundError('No such listing.');
    authorize(actor, 'listing.hide', { authorIds: [listing.ownerId] });
    await listing.update({ hiddenAt: input.hidden ? new Date() : null, hiddenNote: input.hidden ? input.note : null }, { transaction });
    await recordAudit(
      actor,
      {
        action: input.hidden ? 'listing.hide' : 'listing.unhide',
        targetType: 'listing',
        targetId: listing.id,
        targetLabel: await nameListing(listing, transaction),
        note: input.note,
      },
      transaction,
    );
  });
  return getListing(actor, listingId);
}
