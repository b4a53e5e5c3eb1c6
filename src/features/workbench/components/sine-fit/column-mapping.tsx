import { useId, type ReactNode } from 'react';
import { Field, describe, inputClass } from '@/components/ui/form-bits.tsx';
import { displacementOptions, voltageOptions } from '@/features/workbench/unit-options.ts';
import type { ColumnMapping, TimeUnit } from './sine-csv.ts';
import type { SineRecordState } from './use-sine-record.ts';

const timeOptions: { value: TimeUnit; label: string }[] = [
  { value: 's', label: 's' },
  { value: 'ms', label: 'ms' },
  { value: 'us', label: 'µs' },
];

function Select<T extends string | number>({
  label,
  value,
  options,
  onChange,
}: {
  label: ReactNode;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
}) {
  const id = useId();
  return (
    <Field id={id} label={label}>
      <select
        id={id}
        className={inputClass}
        value={String(value)}
        onChange={(e) => onChange(options.find((o) => String(o.value) === e.target.value)!.value)}
      >
        {options.map((o) => (
          <option key={String(o.value)} value={String(o.value)}>
            {o.label}
          </option>
        ))}
      </select>
    </Field>
  );
}

/** Which column is time, drive and displacement, the unit of each, and the drive frequency when known. */
export function ColumnMappingFields({ state }: { state: SineRecordState }) {
  const frequencyId = useId();
  const columns = state.table.names.map((name, i) => ({ value: i, label: `${i + 1}: ${name}` }));
  const setColumn = (key: keyof ColumnMapping) => (value: number) => state.setMapping({ ...state.mapping, [key]: value });
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      {columns.length > 0 && (
        <>
          <Select label="Time column" value={state.mapping.time} options={columns} onChange={setColumn('time')} />
          <Select label="Time unit" value={state.timeUnit} options={timeOptions} onChange={state.setTimeUnit} />
          <Select label="Drive column" value={state.mapping.volts} options={columns} onChange={setColumn('volts')} />
          <Select label="Drive unit" value={state.voltageUnit} options={voltageOptions} onChange={state.setVoltageUnit} />
          <Select label="Displacement column" value={state.mapping.displacement} options={columns} onChange={setColumn('displacement')} />
          <Select
            label="Displacement unit"
            value={state.displacementUnit}
            options={displacementOptions}
            onChange={state.setDisplacementUnit}
          />
        </>
      )}
      <Field
        id={frequencyId}
        className="sm:col-span-2"
        label="Drive frequency (Hz) · optional"
        hint="Known from the generator? Enter it for the three-parameter fit; leave it empty and the frequency is fitted from the drive."
        error={state.frequencyError}
      >
        <input
          id={frequencyId}
          inputMode="decimal"
          className={`num ${inputClass}`}
          value={state.frequencyText}
          onChange={(e) => state.setFrequencyText(e.target.value)}
          {...describe(frequencyId, state.frequencyError, true)}
        />
      </Field>
    </div>
  );
}
