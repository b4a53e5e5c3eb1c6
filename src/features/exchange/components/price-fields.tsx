import type { UseFormRegister, FieldErrors } from 'react-hook-form';
import type { z } from 'zod';
import { type createListingInput } from '@shared/schemas/listing.ts';
import { PRICE_KINDS, type PriceKind } from '@shared/schemas/listing-vocabulary.ts';
import { InputField, numberOrNull } from '@/components/ui/form-bits.tsx';

type Values = z.input<typeof createListingInput>;
const priceKindLabels: Record<PriceKind, string> = { price: 'For a price', free: 'Free', swap: 'Swap' };

/** Price, free or swap; a price asks for an amount and a three-letter currency. */
export function PriceFields({
  register,
  errors,
  priceKind,
}: {
  register: UseFormRegister<Values>;
  errors: FieldErrors<Values>;
  priceKind: PriceKind | undefined;
}) {
  const amountError =
    errors.priceAmount &&
    (errors.priceAmount.type === 'custom' || errors.priceAmount.type === 'server' ? errors.priceAmount.message : 'An amount such as 4.50.');
  const currencyError = errors.currency && 'Three capital letters, such as EUR.';
  return (
    <fieldset className="space-y-3">
      <legend className="mb-1 text-sm font-medium">Price</legend>
      <div className="flex flex-wrap gap-4">
        {PRICE_KINDS.map((k) => (
          <label key={k} className="inline-flex items-center gap-2 text-sm">
            <input type="radio" value={k} className="h-4 w-4 accent-copper" {...register('priceKind')} />
            {priceKindLabels[k]}
          </label>
        ))}
      </div>
      {priceKind === 'price' && (
        <div className="grid max-w-md grid-cols-[1fr_7rem] gap-3">
          <InputField
            id="listing-amount"
            label="Amount"
            error={amountError}
            type="text"
            inputMode="decimal"
            min={0}
            step="0.01"
            className="num"
            {...register('priceAmount', { setValueAs: numberOrNull })}
          />
          <InputField
            id="listing-currency"
            label="Currency"
            error={currencyError}
            maxLength={3}
            autoCapitalize="characters"
            className="num uppercase"
            {...register('currency', { setValueAs: (v: string) => (v ? v.trim().toUpperCase() : null) })}
          />
        </div>
      )}
    </fieldset>
  );
}
