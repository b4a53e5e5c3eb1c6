import { useState } from 'react';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { usePartOptions, usePickedPart } from '../api/part-options.ts';
import { InputField, SelectField } from '@/components/ui/form-bits.tsx';

/**
 * Pick a listed part: type to narrow the list, then choose it in the select below (both labelled,
 * both keyboard-native). The chosen part stays in the list while the search changes.
 */
export function PartPicker({
  value,
  onChange,
  error,
}: {
  value: number | undefined;
  onChange: (id: number | undefined) => void;
  error?: string;
}) {
  const [q, setQ] = useState('');
  const options = usePartOptions(q);
  const picked = usePickedPart(value);
  const items = options.data?.items ?? [];
  const pickedMissing = value !== undefined && !items.some((p) => p.id === value);
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <InputField
        id="part-search"
        label="Find a part"
        hint="Name or salvage source; only parts in the registry can be listed."
        type="search"
        value={q}
        maxLength={100}
        autoComplete="off"
        onChange={(e) => setQ(e.target.value)}
      />
      <SelectField
        id="listing-part"
        label="Part"
        error={error}
        value={value ?? ''}
        onChange={(e) => onChange(e.target.value ? Number(e.target.value) : undefined)}
      >
        <option value="">{options.isPending ? 'Loading parts…' : items.length ? 'Choose a part…' : 'No part matches'}</option>
        {pickedMissing && <option value={value}>{picked.data?.name ?? `Part ${value}`}</option>}
        {items.map((p) => (
          <option key={p.id} value={p.id}>
            {p.name} ({partCategoryLabels[p.category]})
          </option>
        ))}
      </SelectField>
    </div>
  );
}
