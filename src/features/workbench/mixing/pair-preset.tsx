import { useId, useState } from 'react';
import { equalGainPairMatrix } from '@shared/workbench/mixing.ts';
import { Button } from '@/components/ui/button.tsx';
import { roundMatrix, type MixingFormApi } from './mixing-form.ts';

/** Fills G for two equal benders meeting at ±45°: x = g(Va − Vb)/√2, y = g(Va + Vb)/√2. */
export function PairPreset({ form }: { form: MixingFormApi }) {
  const id = useId();
  const [g, setG] = useState('100');
  const value = Number(g);
  const valid = g.trim() !== '' && Number.isFinite(value) && value > 0;
  return (
    <div className="rounded-md border border-dashed border-rule p-3">
      <p className="text-sm font-medium">Equal-gain ±45° bender pair</p>
      <p className="text-xs text-ink-soft">
        Two equal benders meeting at the tip at 90°: in phase moves along y, anti-phase along x (common practice; small-angle, linear).
      </p>
      <div className="mt-2 flex flex-wrap items-end gap-2">
        <div>
          <label htmlFor={id} className="block text-sm">
            Gain of each bender g <span className="text-ink-soft">(nm/V)</span>
          </label>
          <input
            id={id}
            type="text"
            inputMode="decimal"
            step="any"
            value={g}
            onChange={(e) => setG(e.target.value)}
            aria-invalid={!valid || undefined}
            className="num mt-1 w-32 rounded-md border border-rule bg-white px-2 py-1.5 aria-[invalid=true]:border-danger"
          />
        </div>
        <Button
          variant="secondary"
          disabled={!valid}
          onClick={() => form.setValue('gain', roundMatrix(equalGainPairMatrix(value)), { shouldValidate: true })}
        >
          Fill G for this pair
        </Button>
      </div>
    </div>
  );
}
