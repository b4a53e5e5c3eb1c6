import { cautionsFor, HIGH_VOLTAGE_THRESHOLD_V } from '@shared/workbench/safety.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** Id of the one full caution block on a build page, so each high-voltage actuator can point at it. */
export const HV_CAUTIONS_ID = 'high-voltage-cautions';

/** True when an actuator's stated drive limit is above the high-voltage threshold (50 V). */
export const isHighVoltage = (maxVolts: number | null) => maxVolts !== null && Math.abs(maxVolts) > HIGH_VOLTAGE_THRESHOLD_V;

/** The full high-voltage cautions, shown once above the actuators when any of them runs above 50 V. */
export function HighVoltageCautions() {
  return (
    <div id={HV_CAUTIONS_ID} className="scroll-mt-4">
      <Notice tone="caution" title={`High voltage: some actuators of this build are driven above ${HIGH_VOLTAGE_THRESHOLD_V} V`}>
        <ul className="list-disc space-y-1 pl-5">
          {cautionsFor({ highVoltage: true, storedCharge: false }).map((c) => <li key={c.id}>{c.text}</li>)}
        </ul>
      </Notice>
    </div>
  );
}

/** A short amber line on one actuator, pointing to the full cautions. */
export function HighVoltageMarker({ maxVolts }: { maxVolts: number }) {
  return (
    <p className="flex flex-wrap items-center gap-x-2 rounded-md border border-amber bg-amber/10 px-3 py-1.5 text-sm">
      <span aria-hidden="true" className="font-bold text-amber">⚠</span>
      <span>High voltage: driven up to <span className="num font-medium">{maxVolts} V</span>.</span>
      <a href={`#${HV_CAUTIONS_ID}`} className="text-copper-dark underline">Read the cautions</a>
    </p>
  );
}
