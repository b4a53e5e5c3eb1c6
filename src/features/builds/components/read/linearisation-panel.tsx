import type { LinearisationDto } from '@shared/schemas/linearise.ts';
import { formatFixed, formatSig } from '@shared/format/measured-number.ts';
import { formatDate } from '@shared/format/dates.ts';

const BRANCH = { up: 'up sweep', down: 'down sweep', all: 'all points' } as const;

/** An actuator's saved drive linearisation: the nonlinearity before and after, each branch's curve, and the table to download. */
export function LinearisationPanel({ actuatorId, lin }: { actuatorId: number; lin: LinearisationDto }) {
  const branches = Object.entries(lin.branches) as Array<[keyof typeof BRANCH, NonNullable<LinearisationDto['branches']['up']>]>;
  return (
    <section aria-label="Drive linearisation" className="rounded-md border border-rule bg-white p-3 text-sm">
      <h4 className="font-semibold">Drive linearisation{lin.measuredOn ? ` · measured ${formatDate(lin.measuredOn)}` : ''}</h4>
      <p className="mt-1">
        Nonlinearity <span className="num">{formatFixed(lin.nonlinearityPctBefore, 2)} %</span> of span on a straight line →{' '}
        <span className="num font-semibold">{formatFixed(lin.residualNonlinearityPctAfter, 2)} %</span> left when driven through the table
        (span <span className="num">{formatSig(lin.spanNm)} nm</span>).
      </p>
      <ul className="mt-1 text-ink-soft">
        {branches.map(([name, b]) => (
          <li key={name}>
            {BRANCH[name]}: degree {b.degree} from {b.n} points, residual SD <span className="num">{formatSig(b.residualStdNm, 2)} nm</span>
          </li>
        ))}
      </ul>
      <p className="mt-1">
        Drive table, {lin.tableRows} rows:{' '}
        <a className="text-teal-dark underline" href={`/api/actuators/${actuatorId}/linearisation/table?format=csv`} download>
          CSV
        </a>{' '}
        ·{' '}
        <a className="text-teal-dark underline" href={`/api/actuators/${actuatorId}/linearisation/table?format=c`} download>
          C array
        </a>
      </p>
    </section>
  );
}
