import { useDeferredValue, useId, useMemo, useState } from 'react';
import { gainMatrixFitInput } from '@shared/schemas/workbench.ts';
import { mixingFitCalculator } from '@shared/workbench/calculators/mixing-calculators.ts';
import { Button } from '@/components/ui/button.tsx';
import { RowProblems } from '../components/row-problems.tsx';
import { readNumericColumns } from '@/lib/csv/split-csv.ts';
import { formatLengthNm, formatSig } from '@shared/format/measured-number.ts';
import { friendlyError, refusalMessage } from '../form/error-map.ts';
import { roundMatrix, type MixingFormApi } from './mixing-form.ts';

const models = [
  { value: 'affine', label: 'With offsets x₀, y₀' },
  { value: 'origin', label: 'Through the origin' },
] as const;

function fitGrid(text: string, model: 'affine' | 'origin') {
  const { rows, problems } = readNumericColumns(text, ['Va', 'Vb', 'x', 'y']);
  const samples = rows.map(({ values: [vaV, vbV, xNm, yNm] }) => ({ vaV, vbV, xNm, yNm }));
  const parsed = gainMatrixFitInput.safeParse({ samples, model }, { error: friendlyError });
  if (!parsed.success)
    return { used: samples.length, problems, fit: null, message: 'A fit of G needs at least 3 good rows (4 with offsets).' };
  try {
    return { used: samples.length, problems, fit: mixingFitCalculator.compute(parsed.data), message: null };
  } catch (err) {
    return { used: samples.length, problems, fit: null, message: refusalMessage(err) };
  }
}

/** Fit G from a grid of drive pairs and measured tip positions, then use it above. */
export function GridFitPanel({ form }: { form: MixingFormApi }) {
  const id = useId();
  const [text, setText] = useState('');
  const [model, setModel] = useState<'affine' | 'origin'>('affine');
  const deferred = useDeferredValue(text);
  const r = useMemo(() => (deferred.trim() ? fitGrid(deferred, model) : null), [deferred, model]);
  return (
    <div className="space-y-2 rounded-md border border-dashed border-rule p-3">
      <label htmlFor={id} className="block text-sm font-medium">
        Fit G from a grid
      </label>
      <textarea
        id={id}
        rows={5}
        spellCheck={false}
        value={text}
        onChange={(e) => setText(e.target.value)}
        aria-describedby={`${id}-hint`}
        placeholder={'Va,Vb,x,y\n0,0,0,0\n10,0,707,707\n0,10,-707,707\n…'}
        className="num w-full rounded-md border border-rule bg-white px-2 py-1.5 text-sm"
      />
      <p id={`${id}-hint`} className="text-xs text-ink-soft">
        One row per drive pair: Va and Vb in V, measured x and y in nm. Least squares of x = x₀ + G·V; an indicator's zero need not be the
        rest position.
      </p>
      <fieldset className="flex flex-wrap gap-3 text-sm">
        <legend className="sr-only">Fit model</legend>
        {models.map((m) => (
          <label key={m.value} className="inline-flex items-center gap-1">
            <input type="radio" name={`${id}-model`} value={m.value} checked={model === m.value} onChange={() => setModel(m.value)} />
            {m.label}
          </label>
        ))}
      </fieldset>
      {r && <RowProblems used={r.used} problems={r.problems} what="Line" noun="row" />}
      {r?.message && (
        <p role="status" className="text-sm text-danger">
          {r.message}
        </p>
      )}
      {r?.fit && (
        <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
          <p>
            G ={' '}
            <span className="num">
              [[{r.fit.gainNmPerV[0].map((v) => formatSig(v)).join(', ')}], [{r.fit.gainNmPerV[1].map((v) => formatSig(v)).join(', ')}]]
            </span>{' '}
            nm/V
            {r.fit.model === 'affine' && (
              <>
                ; offsets x₀ <span className="num">{formatSig(r.fit.offsetNm[0])}</span>, y₀{' '}
                <span className="num">{formatSig(r.fit.offsetNm[1])}</span> nm
              </>
            )}
            ; residual SD x <span className="num">{formatLengthNm(r.fit.residualStdXNm).value}</span>{' '}
            {formatLengthNm(r.fit.residualStdXNm).unit}, y <span className="num">{formatLengthNm(r.fit.residualStdYNm).value}</span>{' '}
            {formatLengthNm(r.fit.residualStdYNm).unit}
          </p>
          <Button
            variant="secondary"
            onClick={() => {
              const fit = r.fit;
              form.setValue('gain', roundMatrix(fit.gainNmPerV), { shouldValidate: true });
              form.setValue('offsetXNm', Number(fit.offsetNm[0].toPrecision(6)));
              form.setValue('offsetYNm', Number(fit.offsetNm[1].toPrecision(6)));
              form.setValue('model', fit.model);
            }}
          >
            Use this G
          </Button>
        </div>
      )}
    </div>
  );
}
