import type { UseFormReturn } from 'react-hook-form';
import { sourceInWords } from '@shared/workbench/source-words.ts';
import { materialKeys, materials, type MaterialKey } from '@shared/workbench/materials.ts';
import { FieldGroup, FormNumber, FormSelect } from '../components/fields.tsx';
import { constantLabels, type Constant } from './actuator-kinds.ts';
import type { expectedGainForm } from './expected-gain-form.ts';
import type { z } from 'zod';

type Form = UseFormReturn<z.input<typeof expectedGainForm>, unknown, z.output<typeof expectedGainForm>>;

const options = [...materialKeys.map((k) => ({ value: k, label: k })), { value: 'custom', label: 'Custom constants' }];
const constants: readonly Constant[] = ['d31PmPerV', 'd33PmPerV', 'd15PmPerV'];
const pm = (v: number) => `${v < 0 ? '\u2212' : ''}${Math.abs(v)}`;

/** Material family with its source tag and constants, or the user's own d constants. */
export function MaterialFields({ form, needed }: { form: Form; needed: Constant }) {
  const key = form.watch('materialKey');
  const material = key === 'custom' ? null : materials[key as MaterialKey];
  return (
    <FieldGroup
      legend="Material"
      note="Families, not grades: real parts vary by about ±20 %, and a salvaged element may be another ceramic entirely."
    >
      <FormSelect form={form} name="materialKey" label="Piezoceramic" options={options} />
      {material ? (
        <div className="text-sm" aria-live="polite">
          <p className="num">
            d31 {pm(material.d31PmPerV)} · d33 {pm(material.d33PmPerV)} · d15 {pm(material.d15PmPerV)}{' '}
            <span className="font-sans">pm/V</span>
          </p>
          <p className="mt-1 text-xs text-ink-soft">{sourceInWords(material.source)}</p>
        </div>
      ) : (
        constants.map((c) => (
          <FormNumber
            key={c}
            form={form}
            name={`custom.${c}`}
            label={constantLabels[c]}
            unit="pm/V"
            optional={c !== needed}
            hint={c === needed ? 'Used by this actuator; the sign is ignored.' : undefined}
          />
        ))
      )}
    </FieldGroup>
  );
}
