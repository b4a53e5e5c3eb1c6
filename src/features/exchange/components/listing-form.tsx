import { useEffect } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { currencyOfRegionText, defaultCurrency } from '@shared/exchange/currency-by-region.ts';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { createListingInput, type CreateListingInput } from '@shared/schemas/listing.ts';
import { LISTING_CONDITIONS, LISTING_KINDS, listingConditionLabels } from '@shared/schemas/listing-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { applyServerErrors, FormError, InputField, SelectField, TextAreaField, textOrUndefined } from '@/components/ui/form-bits.tsx';
import { PartPicker } from './part-picker.tsx';
import { PriceFields } from './price-fields.tsx';

type Values = z.input<typeof createListingInput>;
const FIELDS = ['partId', 'kind', 'quantity', 'condition', 'priceKind', 'priceAmount', 'currency', 'region', 'shipsTo', 'notes'] as const;

/** The listing form, for a new listing and for the owner's edits: part, kind, quantity, condition, price, where, notes. */
export function ListingForm({
  defaults,
  submitLabel,
  onSave,
}: {
  defaults?: Partial<Values>;
  submitLabel: string;
  onSave: (input: CreateListingInput) => Promise<unknown>;
}) {
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    control,
    formState: { errors, isSubmitting, dirtyFields },
  } = useForm<Values, unknown, CreateListingInput>({
    resolver: zodResolver(createListingInput),
    defaultValues: {
      kind: 'offering',
      quantity: 1,
      condition: 'salvaged-tested',
      priceKind: 'free',
      priceAmount: null,
      currency: defaultCurrency('', navigator.languages),
      region: '',
      shipsTo: '',
      notes: '',
      ...defaults,
    },
  });
  const priceKind = useWatch({ control, name: 'priceKind' });
  // On a new listing the currency follows a country named in the region ("Leeds, UK") until the maker picks one.
  const region = useWatch({ control, name: 'region' });
  const fromRegion = currencyOfRegionText(region ?? '');
  useEffect(() => {
    if (fromRegion && !dirtyFields.currency && !defaults?.currency) setValue('currency', fromRegion);
  }, [fromRegion, dirtyFields.currency, defaults?.currency, setValue]);
  const text = { setValueAs: textOrUndefined };

  const submit = handleSubmit(async (values) => {
    const input = values.priceKind === 'price' ? values : { ...values, priceAmount: null, currency: null };
    try {
      await onSave(input);
    } catch (err) {
      applyServerErrors(err, setError, FIELDS);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="max-w-3xl space-y-5">
      <Controller
        control={control}
        name="partId"
        render={({ field }) => (
          <PartPicker
            value={field.value}
            onChange={field.onChange}
            error={errors.partId && (errors.partId.type === 'server' ? errors.partId.message : 'Choose a part from the registry.')}
          />
        )}
      />
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Offering or seeking</legend>
        <div className="flex flex-wrap gap-4">
          {LISTING_KINDS.map((k) => (
            <label key={k} className="inline-flex items-center gap-2 text-sm">
              <input type="radio" value={k} className="h-4 w-4 accent-copper" {...register('kind')} />
              {k === 'offering' ? 'Offering: I have spares' : 'Seeking: I am looking for parts'}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-[8rem_1fr]">
        <InputField
          id="listing-quantity"
          label="Quantity"
          error={errors.quantity && 'A whole number from 1 to 10 000.'}
          type="number"
          inputMode="numeric"
          min={1}
          step={1}
          className="num"
          {...register('quantity', { valueAsNumber: true })}
        />
        <SelectField id="listing-condition" label="Condition" error={errors.condition?.message} {...register('condition')}>
          {LISTING_CONDITIONS.map((c) => (
            <option key={c} value={c}>
              {listingConditionLabels[c]}
            </option>
          ))}
        </SelectField>
      </div>
      <PriceFields register={register} errors={errors} priceKind={priceKind} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField
          id="listing-region"
          label="Region"
          hint="Town or area, so people can judge shipping."
          error={errors.region && 'Give a region of 2 to 80 characters.'}
          autoComplete="address-level2"
          {...register('region')}
        />
        <InputField
          id="listing-ships"
          label="Ships to"
          hint="e.g. EU, UK only, worldwide, collection only."
          error={errors.shipsTo?.message}
          {...register('shipsTo', text)}
        />
      </div>
      <TextAreaField
        id="listing-notes"
        label="Notes"
        hint="Tested how, what's wrong with them, what you'd swap for. Markdown works."
        error={errors.notes?.message}
        rows={5}
        {...register('notes', text)}
      />
      <FormError message={errors.root?.server?.message} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Saving…' : submitLabel}
      </Button>
    </form>
  );
}
