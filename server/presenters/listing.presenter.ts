import { can, type Actor } from '@shared/policies.ts';
import { type ListingDto, type ListingPhotoDto } from '@shared/schemas/listing.ts';
import { priceLabel } from '@shared/schemas/listing-vocabulary.ts';
import type { Listing } from '../models/listing.model.ts';
import type { Part } from '../models/part.model.ts';

/** The part columns a listing shows. */
export type ListingPartRow = Pick<Part, 'id' | 'name' | 'category' | 'gainMedianNmPerV'>;

/** What one listing needs beside its own row, loaded in batches by the listing service. */
export interface ListingExtras {
  part: ListingPartRow;
  ownerLogin: string;
  photos: ListingPhotoDto[];
}

/** A listing as the exchange shows it to this actor: a field allow-list; the hidden note only for owner and moderators. */
export function presentListing(actor: Actor | null, l: Listing, extras: ListingExtras): ListingDto {
  const { part } = extras;
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
    owner: { id: l.ownerId, login: extras.ownerLogin },
    photos: extras.photos,
    createdAt: l.createdAt.toISOString(),
    updatedAt: l.updatedAt.toISOString(),
    abilities: {
      edit: can(actor, 'listing.edit', { ownerId: l.ownerId }),
      message: can(actor, 'listing.message', { ownerId: l.ownerId }) && l.status !== 'closed' && l.hiddenAt === null,
      hide: can(actor, 'listing.hide'),
    },
  };
}
