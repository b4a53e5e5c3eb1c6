import type { ReactNode } from 'react';
import { type ActuatorDto } from '@shared/schemas/actuator.ts';
import { actuatorDriveLabels } from '@shared/schemas/actuator-vocabulary.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { formatShort } from '@shared/format/measured-number.ts';
import { describeBasis } from './format.ts';

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-ink-soft">{term}</dt>
      <dd className="text-sm">{children}</dd>
    </div>
  );
}

const notStated = <span className="text-ink-soft">not stated</span>;

/** Part, axis, drive, amplifier, drive limit and the expected gain with its band. */
export function ActuatorFacts({ actuator }: { actuator: ActuatorDto }) {
  const { part, expectedGain } = actuator;
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-3 sm:grid-cols-3">
      <Fact term="Part">
        <span className="font-medium">{part.name}</span>
        <span className="block text-xs text-ink-soft">
          {partCategoryLabels[part.category]}
          {part.material ? ` · ${part.material}` : ''}
        </span>
      </Fact>
      <Fact term="Axis">
        <span className="num">{actuator.axis}</span>
      </Fact>
      <Fact term="Drive">{actuatorDriveLabels[actuator.drive]}</Fact>
      <Fact term="Amplifier">{actuator.amplifier || notStated}</Fact>
      <Fact term="Max drive">{actuator.maxVolts !== null ? <span className="num">{actuator.maxVolts} V</span> : notStated}</Fact>
      <Fact term="Expected gain">
        {expectedGain ? (
          <>
            <span className="num">{formatShort(expectedGain.gainNmPerV, 3)} nm/V</span>
            <span className="block text-xs text-ink-soft">
              band{' '}
              <span className="num">
                {formatShort(expectedGain.lowNmPerV, 2)}–{formatShort(expectedGain.highNmPerV, 2)} nm/V
              </span>{' '}
              · {describeBasis(expectedGain.basis)}
            </span>
          </>
        ) : (
          <span className="text-ink-soft">no formula for this part</span>
        )}
      </Fact>
    </dl>
  );
}
