import { z } from 'zod';
import { multiLine, singleLine } from './text.ts';
import type { AttachedPhotoDto } from './attached-photo.ts';
import { PART_CATEGORIES, type PartCategory } from './part-vocabulary.ts';
import {
  LISTING_KINDS,
  type ListingKind,
  LISTING_CONDITIONS,
  type ListingCondition,
  PRICE_KINDS,
  type PriceKind,
  LISTING_STATUSES,
  type ListingStatus,
} from './listing-vocabulary.ts';

const text = (max: number) => singleLine(max);
const longText = (max: number) => multiLine(max).trim();

const listingFields = {
  partId: z.number().int().positive(),
  kind: z.enum(LISTING_KINDS),
  quantity: z.number().int().min(1).max(10_000),
  condition: z.enum(LISTING_CONDITIONS),
  priceKind: z.enum(PRICE_KINDS),
  priceAmount: z.number().min(0).max(1_000_000).multipleOf(0.01).nullable().optional(),
  currency: z
    .string()
    .trim()
    .regex(/^[A-Z]{3}$/, 'A three-letter currency code such as EUR.')
    .nullable()
    .optional(),
  region: text(80).min(2),
  shipsTo: text(160).optional(),
  notes: longText(4000).optional(),
};

const priceRule = (v: { priceKind?: PriceKind; priceAmount?: number | null; currency?: string | null }) =>
  v.priceKind !== 'price' || (v.priceAmount != null && !!v.currency);

export const createListingInput = z
  .strictObject(listingFields)
  .refine(priceRule, { message: 'A price needs an amount and a currency.', path: ['priceAmount'] });
export type CreateListingInput = z.infer<typeof createListingInput>;

export const updateListingInput = z
  .strictObject({ ...listingFields, status: z.enum(LISTING_STATUSES) })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdateListingInput = z.infer<typeof updateListingInput>;

const boolParam = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');
export const listListingsQuery = z.strictObject({
  q: text(100).optional(),
  kind: z.enum(LISTING_KINDS).optional(),
  category: z.enum(PART_CATEGORIES).optional(),
  condition: z.enum(LISTING_CONDITIONS).optional(),
  region: text(80).optional(),
  freeOnly: boolParam.optional(),
  partId: z.coerce.number().int().positive().optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(50).default(20),
});
export type ListListingsQuery = z.infer<typeof listListingsQuery>;

export const listingIdParams = z.strictObject({ listingId: z.coerce.number().int().positive() });
export const hideListingInput = z.strictObject({ hidden: z.boolean(), note: text(4000).min(1, 'Say why.') });
export type HideListingInput = z.infer<typeof hideListingInput>;

/** A listing's photo (see attached-photo.ts for how they are uploaded). */
export type ListingPhotoDto = AttachedPhotoDto;

export interface ListingDto {
  id: number;
  kind: ListingKind;
  part: { id: number; name: string; category: PartCategory; gainMedianNmPerV: number | null };
  quantity: number;
  condition: ListingCondition;
  priceKind: PriceKind;
  priceAmount: number | null;
  currency: string | null;
  priceLabel: string;
  region: string;
  shipsTo: string | null;
  notes: string | null;
  status: ListingStatus;
  hidden: boolean;
  hiddenNote: string | null;
  owner: { id: number; login: string };
  photos: ListingPhotoDto[];
  createdAt: string;
  updatedAt: string;
  abilities: { edit: boolean; message: boolean; hide: boolean };
}

export interface ListingListDto {
  items: ListingDto[];
  total: number;
  page: number;
  pageSize: number;
}

export const sendMessageInput = z.strictObject({ body: longText(4000).min(1, 'Write a message.') });
export type SendMessageInput = z.infer<typeof sendMessageInput>;
export const threadIdParams = z.strictObject({ threadId: z.coerce.number().int().positive() });

export interface ThreadSummaryDto {
  id: number;
  listing: { id: number; kind: ListingKind; partName: string; status: ListingStatus };
  other: { id: number; login: string };
  role: 'owner' | 'enquirer';
  lastMessageAt: string;
  lastMessage: string;
  unread: number;
}

export interface MessageDto {
  id: number;
  fromMe: boolean;
  sender: string;
  body: string;
  createdAt: string;
}

export interface ThreadDto extends ThreadSummaryDto {
  messages: MessageDto[];
}
