// The exchange's listing vocabulary (kinds, conditions, price kinds, statuses, their words and the price line), apart
// from the zod schemas so a page that only shows a listing does not load the validation library.

export const LISTING_KINDS = ['offering', 'seeking'] as const;
export type ListingKind = (typeof LISTING_KINDS)[number];
export const LISTING_CONDITIONS = ['new', 'salvaged-tested', 'salvaged-untested'] as const;
export type ListingCondition = (typeof LISTING_CONDITIONS)[number];
export const PRICE_KINDS = ['price', 'free', 'swap'] as const;
export type PriceKind = (typeof PRICE_KINDS)[number];
export const LISTING_STATUSES = ['open', 'reserved', 'closed'] as const;
export type ListingStatus = (typeof LISTING_STATUSES)[number];

export const listingConditionLabels: Record<ListingCondition, string> = {
  new: 'New',
  'salvaged-tested': 'Salvaged, tested',
  'salvaged-untested': 'Salvaged, untested',
};

/** Price as shown: "12.50 EUR", "free" or "swap". */
export function priceLabel(kind: PriceKind, amount: number | null, currency: string | null): string {
  if (kind === 'free') return 'Free';
  if (kind === 'swap') return 'Swap';
  return `${(amount ?? 0).toFixed(2)} ${currency ?? ''}`.trim();
}
