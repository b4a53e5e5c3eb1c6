import type { ReactNode } from 'react';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { RunDto } from '@shared/schemas/run.ts';
import { formatFixed, formatShort } from '@shared/format/measured-number.ts';
import { describeBasis } from './format.ts';

/** How the selected run was driven, under which conditions, and how its gain compares with the expected one. */
export function RunDetails({ run, expected }: { run: RunDto; expected: ActuatorDto['expectedGain'] }) {
  const { drive, conditions } = run;
  const ratio = expected && expected.gainNmPerV > 0 ? run.fit.gainNmPerV / expected.gainNmPerV : null;
  const items: { term: string; value: ReactNode }[] = [];
  if (ratio !== null) {
    items.push({
      term: 'Measured ÷ expected',
      value: (
        <>
          <span className="num font-medium">{formatFixed(ratio, 2)} ×</span> expected ({describeBasis(expected!.basis)})
        </>
      ),
    });
  }
  if (drive) {
    items.push({
      term: 'Drive',
      value:
        drive.kind === 'sine' ? (
          <>
            sine, <span className="num">{formatShort(drive.frequencyHz, 3)} Hz</span>,{' '}
            <span className="num">{formatShort(drive.amplitudeV, 3)} V</span> amplitude
          </>
        ) : (
          'DC steps'
        ),
    });
  }
  if (conditions?.preload) items.push({ term: 'Preload', value: conditions.preload });
  if (conditions?.temperatureC !== undefined)
    items.push({ term: 'Temperature', value: <span className="num">{conditions.temperatureC} °C</span> });
  if (conditions?.notes) items.push({ term: 'Conditions', value: conditions.notes });
  if (run.notes) items.push({ term: 'Notes', value: <span className="whitespace-pre-line">{run.notes}</span> });
  if (items.length === 0) return null;
  return (
    <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[auto_1fr]">
      {items.map((i) => (
        <div key={i.term} className="contents">
          <dt className="text-ink-soft">{i.term}</dt>
          <dd className="mb-1 sm:mb-0">{i.value}</dd>
        </div>
      ))}
    </dl>
  );
}
