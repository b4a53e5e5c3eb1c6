import { asNumber, errorOf } from '../components/fields.tsx';
import type { MixingFormApi } from './mixing-form.ts';

const cells = [
  { name: 'gain.0.0', label: 'x per volt on Va' },
  { name: 'gain.0.1', label: 'x per volt on Vb' },
  { name: 'gain.1.0', label: 'y per volt on Va' },
  { name: 'gain.1.1', label: 'y per volt on Vb' },
] as const;

/** The 2 × 2 gain matrix G as a small labelled table (nm/V). */
export function GainMatrixFields({ form }: { form: MixingFormApi }) {
  const errors = cells.map((c) => errorOf(form, c.name)).filter(Boolean);
  const input = (i: number) => (
    <input
      type="text"
      inputMode="decimal"
      step="any"
      aria-label={`${cells[i].label} (nm/V)`}
      aria-invalid={errorOf(form, cells[i].name) ? true : undefined}
      className="num w-full min-w-0 rounded-md border border-rule bg-white px-2 py-1.5 aria-[invalid=true]:border-danger"
      {...form.register(cells[i].name, asNumber)}
    />
  );
  return (
    <div>
      <table className="w-full table-fixed text-sm">
        <caption className="mb-1 text-left text-sm text-ink-soft">Tip motion per volt on each bender, G (nm/V)</caption>
        <thead className="text-xs text-ink-soft">
          <tr>
            <th scope="col" className="w-16">
              <span className="sr-only">Axis</span>
            </th>
            <th scope="col" className="pb-1 font-medium">
              Va
            </th>
            <th scope="col" className="pb-1 font-medium">
              Vb
            </th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row" className="pr-2 text-left font-medium">
              x
            </th>
            <td className="pr-2 pb-1">{input(0)}</td>
            <td className="pb-1">{input(1)}</td>
          </tr>
          <tr>
            <th scope="row" className="pr-2 text-left font-medium">
              y
            </th>
            <td className="pr-2">{input(2)}</td>
            <td>{input(3)}</td>
          </tr>
        </tbody>
      </table>
      {errors.length > 0 && <p className="mt-1 text-xs font-medium text-danger">{errors[0]}</p>}
    </div>
  );
}
