import type { Transaction } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import { Listing } from '../models/listing.model.ts';
import { NotFoundError } from '../errors.ts';

/**
 * A listing the actor may see: hidden ones only for the owner and moderators (404 otherwise). With
 * a transaction the row is locked for a change. Lives apart from listing.service.ts so photo,
 * message and report services can load a listing without importing the listing service.
 */
export async function loadListingForView(actor: Actor | null, listingId: number, transaction?: Transaction): Promise<Listing> {
  const listing = await Listing.findByPk(listingId, transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {});
  if (!listing || (listing.hiddenAt && !can(actor, 'listing.view-hidden', { ownerId: listing.ownerId })))
    throw new NotFoundError('No such listing.');
  return listing;
}
